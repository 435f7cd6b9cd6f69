import { useApp } from '../AppContext';
import { selectDraft, selectTool, selectViewFactors } from '../../state/selectors';
import { TOOL_KEYS } from '../chrome/shortcuts';

/** One line under the canvas: what the tool expects, or what is wrong with the geometry. */
export function CanvasStatus() {
  const results = useApp(selectViewFactors);
  const tool = useApp(selectTool);
  const draft = useApp(selectDraft);
  if (results.status === 'invalid' && results.problems.length) {
    const more = results.problems.length > 1 ? ` (+${results.problems.length - 1} more)` : '';
    return <div className="canvas-status problem" role="alert">Geometry problem: {results.problems[0].message}{more}</div>;
  }
  const hint = TOOL_KEYS.find((t) => t.tool === tool)?.hint ?? '';
  const progress = draft.length && (tool === 'enclosure' || tool === 'solid') ? ` — ${draft.length} point${draft.length > 1 ? 's' : ''} so far` : '';
  return <div className="canvas-status">{hint}{progress}</div>;
}
