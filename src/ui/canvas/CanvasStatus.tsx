import { useApp } from '../AppContext';
import { selectDraft, selectTool, selectViewFactors } from '../../state/selectors';
import { toolRegistry } from '../../state/tools/registry';

/** One line under the canvas: what the tool expects, or what is wrong with the geometry. */
export function CanvasStatus() {
  const results = useApp(selectViewFactors);
  const tool = useApp(selectTool);
  const draft = useApp(selectDraft);
  if (results.status === 'invalid' && results.problems.length) {
    const more = results.problems.length > 1 ? ` (+${results.problems.length - 1} more)` : '';
    return (
      <div className="canvas-status problem" role="alert">
        Geometry problem: {results.problems[0].message}
        {more}
      </div>
    );
  }
  const active = toolRegistry.get(tool);
  return (
    <div className="canvas-status">
      {active.hint}
      {active.progress?.(draft) ?? ''}
    </div>
  );
}
