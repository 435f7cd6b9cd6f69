import './canvas.css';
import { useApp } from '../AppContext';
import { selectDraft, selectTool, selectUnits, selectViewFactors } from '../../state/selectors';
import type { AppState } from '../../state/store';
import { toolRegistry } from '../../state/tools/registry';

const selectPointer = (s: AppState) => s.pointer;
const selectEntry = (s: AppState) => s.entry;

/** Coordinates as read on a drawing: six significant digits, no float noise. */
function coord(v: number): string {
  return String(Number(v.toPrecision(6)));
}

/** What is typed for the next point, and the pointer's coordinates in the sketch's units. */
function Readout() {
  const pointer = useApp(selectPointer);
  const entry = useApp(selectEntry);
  const units = useApp(selectUnits);
  return (
    <span className="canvas-readout">
      {entry && (
        <span className="canvas-entry" aria-label="Typed value">
          typed <kbd>{entry}</kbd> Enter to place
        </span>
      )}
      <span className="canvas-pointer" aria-label="Pointer position">
        {pointer ? `x ${coord(pointer[0])}  y ${coord(pointer[1])} ${units}` : ''}
      </span>
    </span>
  );
}

/** One line under the canvas: what the tool expects, or what is wrong with the geometry; the pointer on the right. */
export function CanvasStatus() {
  const results = useApp(selectViewFactors);
  const tool = useApp(selectTool);
  const draft = useApp(selectDraft);
  if (results.status === 'invalid' && results.problems.length) {
    const more = results.problems.length > 1 ? ` (+${results.problems.length - 1} more)` : '';
    return (
      <div className="canvas-status problem" role="alert">
        <span className="canvas-hint">
          Geometry problem: {results.problems[0].message}
          {more}
        </span>
        <Readout />
      </div>
    );
  }
  const active = toolRegistry.get(tool);
  return (
    <div className="canvas-status">
      <span className="canvas-hint">
        {active.hint}
        {active.progress?.(draft) ?? ''}
      </span>
      <Readout />
    </div>
  );
}
