import { useApp } from '../AppContext';
import { selectNotices } from '../../state/selectors';

const selectDismiss = (s: { dismissNotice: (id: number) => void }) => s.dismissNotice;

export function Notices() {
  const notices = useApp(selectNotices);
  const dismiss = useApp(selectDismiss);
  return (
    <div className="notices" aria-live="polite">
      {notices.map((n) => (
        <div key={n.id} className={`notice notice-${n.level}`} role={n.level === 'error' ? 'alert' : 'status'}>
          <span className="notice-text">{n.text}</span>
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
