import { FileButtons } from './FileButtons';
import { HistoryButtons } from './HistoryButtons';
import { useApp } from '../AppContext';

const selectSetHelp = (s: { setHelpOpen: (o: boolean) => void }) => s.setHelpOpen;

export function Header() {
  const setHelp = useApp(selectSetHelp);
  return (
    <header className="header">
      <div className="brand">
        <span className="brand-mark" aria-hidden="true" />
        <span className="brand-name">Tautline</span>
        <span className="brand-tag">2D view factors for long cross-sections</span>
      </div>
      <FileButtons />
      <HistoryButtons />
      <button
        type="button"
        className="help-button"
        title="Keyboard shortcuts and how to draw (?)"
        onClick={() => setHelp(true)}
      >
        Help ?
      </button>
    </header>
  );
}
