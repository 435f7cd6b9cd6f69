import { useApp } from '../AppContext';
import { selectCanRedo, selectCanUndo } from '../../state/selectors';

const selectUndo = (s: { undo: () => void }) => s.undo;
const selectRedo = (s: { redo: () => void }) => s.redo;

export function HistoryButtons() {
  const canUndo = useApp(selectCanUndo);
  const canRedo = useApp(selectCanRedo);
  const undo = useApp(selectUndo);
  const redo = useApp(selectRedo);
  return (
    <div className="group" role="group" aria-label="History">
      <button type="button" title="Undo (Ctrl+Z)" disabled={!canUndo} onClick={undo}>
        Undo
      </button>
      <button type="button" title="Redo (Ctrl+Shift+Z or Ctrl+Y)" disabled={!canRedo} onClick={redo}>
        Redo
      </button>
    </div>
  );
}
