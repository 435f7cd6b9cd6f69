import { useShallow } from 'zustand/react/shallow';
import { useApp, useAppStore } from '../AppContext';
import type { AppState } from '../../state/store';
import type { ToolSetting } from '../../state/tools/tool';
import { toolRegistry } from '../../state/tools/registry';
import { NumberField } from '../inspector/NumberField';
import { GRID_STEP_RULE } from '../../state/edits/numberInput';

const selectToolbar = (s: AppState) => ({
  tool: s.tool,
  snap: s.snap,
  gridStep: s.gridStep,
  units: s.doc.units,
  showNames: s.showNames,
  setShowNames: s.setShowNames,
  setTool: s.setTool,
  setSnap: s.setSnap,
  setGridStep: s.setGridStep,
  requestFit: s.requestFit,
});

type Setting<T extends ToolSetting['type']> = Extract<ToolSetting, { type: T }>;

/** Settings of the active tool; their values live in the store. */
function IntegerSetting({ setting }: { setting: Setting<'integer'> }) {
  const store = useAppStore();
  const value = useApp(setting.read);
  return (
    <NumberField
      label={setting.label}
      title={setting.title}
      value={value}
      onCommit={(n) => setting.write(store.getState(), n)}
      width="2.8em"
      rule={setting.rule}
      integer
    />
  );
}

function ChoiceSetting({ setting }: { setting: Setting<'choice'> }) {
  const store = useAppStore();
  const value = useApp(setting.read);
  return (
    <label className="inline" title={setting.title}>
      {setting.label}
      <select value={value} onChange={(e) => setting.write(store.getState(), e.target.value)}>
        {setting.options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </label>
  );
}

export function Toolbar() {
  const t = useApp(useShallow(selectToolbar));
  const active = toolRegistry.get(t.tool);
  return (
    <div className="toolbar" role="toolbar" aria-label="Drawing tools">
      <div className="group" role="group" aria-label="Tool">
        {toolRegistry.tools.map((k) => (
          <button
            key={k.id}
            type="button"
            className="tool"
            aria-pressed={t.tool === k.id}
            title={`${k.label} (${k.shortcut.toUpperCase()}): ${k.hint}`}
            onClick={() => t.setTool(k.id)}
          >
            {k.label}
          </button>
        ))}
      </div>
      {active.settings?.map((setting) =>
        setting.type === 'integer' ? (
          <IntegerSetting key={setting.label} setting={setting} />
        ) : (
          <ChoiceSetting key={setting.label} setting={setting} />
        ),
      )}
      <label className="inline" title="Snap points to the grid (G)">
        <input type="checkbox" checked={t.snap} onChange={(e) => t.setSnap(e.target.checked)} /> snap
      </label>
      <NumberField
        label={`grid (${t.units})`}
        title={`Grid step in the sketch's units (${GRID_STEP_RULE.min} to ${GRID_STEP_RULE.max})`}
        value={t.gridStep}
        onCommit={t.setGridStep}
        rule={GRID_STEP_RULE}
        width="4em"
      />
      <label className="inline" title="Surface names beside each surface on the canvas (N)">
        <input type="checkbox" checked={t.showNames} onChange={(e) => t.setShowNames(e.target.checked)} /> names
      </label>
      <button type="button" title="Fit the sketch in view (F)" onClick={t.requestFit}>
        Fit
      </button>
    </div>
  );
}
