import { useApp } from '../AppContext';
import type { AppState } from '../../state/store';

const selectNotify = (s: AppState) => s.notify;

/** Copies a table as tab-separated text (for pasting into a spreadsheet), and says whether it worked. */
export function CopyTableButton({
  what,
  tsv,
  label = 'Copy table',
}: {
  what: string;
  tsv: () => string;
  label?: string;
}) {
  const notify = useApp(selectNotify);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(tsv());
      notify('info', `${what} copied; paste it into a spreadsheet.`);
    } catch {
      notify('warning', 'The browser did not allow copying; use the CSV download instead.');
    }
  };
  return (
    <button
      type="button"
      title={`Copy the ${what.toLowerCase()} as tab-separated text (full precision) for a spreadsheet`}
      onClick={() => void copy()}
    >
      {label}
    </button>
  );
}
