import { useApp, useAppStore, useDocumentApi } from '../AppContext';
import { selectNotices } from '../../state/selectors';
import type { Notice } from '../../state/viewSlice';
import { saveSketchFile } from './saveFile';
import { useAutoClose } from './useAutoClose';
import './chrome.css';

const selectDismiss = (s: { dismissNotice: (id: number) => void }) => s.dismissNotice;

export function Notices() {
  const notices = useApp(selectNotices);
  const dismiss = useApp(selectDismiss);
  const store = useAppStore();
  const api = useDocumentApi();
  useAutoClose(notices, dismiss);
  const act = (n: Notice) => {
    if (!n.action) return;
    if (n.action.kind === 'save-file') saveSketchFile(store, api);
    else n.action.run();
    dismiss(n.id);
  };
  return (
    // Beside the side panel's foot: never over the canvas's status line, and only the notices take clicks.
    <div className="notices" aria-live="polite">
      {notices.map((n) => (
        <div key={n.id} className={`notice notice-${n.level}`} role={n.level === 'error' ? 'alert' : 'status'}>
          <span className="notice-text">{n.text}</span>
          {n.action && (
            <button type="button" className="notice-action" onClick={() => act(n)}>
              {n.action.label}
            </button>
          )}
          <button
            type="button"
            className="notice-close"
            title="Dismiss this message"
            aria-label="Dismiss message"
            onClick={() => dismiss(n.id)}
          >
            ×
          </button>
        </div>
      ))}
    </div>
  );
}
