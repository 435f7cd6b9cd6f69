import { useShallow } from 'zustand/react/shallow';
import { useApp } from '../AppContext';
import type { AppState } from '../../state/store';
import { TOOL_KEYS } from './shortcuts';
import { NumberField } from '../inspector/NumberField';

const selectToolbar = (s: AppState) => ({
  tool: s.tool, snap: s.snap, gridStep: s.gridStep, quickKind: s.quickKind, tubeSides: s.tubeSides, units: s.doc.units,
  setTool: s.setTool, setSnap: s.setSnap, setGridStep: s.setGridStep, setQuickKind: s.setQuickKind,
  setTubeSides: s.setTubeSides, requestFit: s.requestFit,
});

export function Toolbar() {
  const t = useApp(useShallow(selectToolbar));
  const quick = t.tool === 'rectangle' || t.tool === 'tube';
  return (
    <div className="toolbar" role="toolbar" aria-label="Drawing tools">
      <div className="group" role="group" aria-label="Tool">
        {TOOL_KEYS.map((k) => (
          <button key={k.tool} type="button" className="tool" aria-pressed={t.tool === k.tool}
            title={`${k.label} (${k.key.toUpperCase()}): ${k.hint}`} onClick={() => t.setTool(k.tool)}>
            {k.label}
          </button>
        ))}
      </div>
      {quick && (
        <label className="inline" title="Whether the rectangle or tube becomes a solid body or the enclosure">
          makes
          <select value={t.quickKind} onChange={(e) => t.setQuickKind(e.target.value as 'solid' | 'enclosure')}>
            <option value="solid">body</option>
            <option value="enclosure">enclosure</option>
          </select>
        </label>
      )}
      {t.tool === 'tube' && (
        <NumberField label="sides" title="Number of sides of the tube polygon (3 to 256)" value={t.tubeSides} onCommit={t.setTubeSides} width="3.5em" integer />
      )}
      <label className="inline" title="Snap points to the grid (G)">
        <input type="checkbox" checked={t.snap} onChange={(e) => t.setSnap(e.target.checked)} /> snap
      </label>
      <NumberField label={`grid (${t.units})`} title="Grid step in the sketch's units" value={t.gridStep} onCommit={t.setGridStep} width="4.5em" />
      <button type="button" title="Fit the sketch in view (F)" onClick={t.requestFit}>Fit</button>
    </div>
  );
}
