import type { MatrixView } from '../../state/matrixView';
import { matrixTsv, shownCsv } from '../../state/matrixExport';
import type { ShownResult } from '../../state/results/derive';
import { NumberField } from '../inspector/NumberField';
import { DIGITS_RULE } from '../../state/edits/numberInput';
import { downloadText } from '../chrome/download';
import { useApp } from '../AppContext';
import type { AppState } from '../../state/store';

const selectSetDigits = (s: AppState) => s.setDigits;
const selectNotify = (s: AppState) => s.notify;

export function MatrixControls({
  shown,
  view,
  digits,
}: {
  shown: ShownResult | null;
  view: MatrixView | null;
  digits: number;
}) {
  const setDigits = useApp(selectSetDigits);
  const notify = useApp(selectNotify);
  const copy = async () => {
    if (!view) return;
    try {
      await navigator.clipboard.writeText(matrixTsv(view, digits));
      notify('info', 'Matrix copied; paste it into a spreadsheet.');
    } catch {
      notify('warning', 'The browser did not allow copying; use the CSV download instead.');
    }
  };
  return (
    <div className="matrix-controls">
      <NumberField
        label="digits"
        title="Decimals shown for each view factor (1 to 15); the CSV always has full precision"
        value={digits}
        onCommit={setDigits}
        width="3em"
        rule={DIGITS_RULE}
        integer
      />
      <button
        type="button"
        disabled={!shown}
        title="Download the matrix as CSV (full precision, same content as the command line's --csv)"
        onClick={() => shown && downloadText('view-factors.csv', shownCsv(shown), 'text/csv')}
      >
        Download CSV
      </button>
      <button
        type="button"
        disabled={!view}
        title="Copy the matrix as tab-separated text with the digits shown, for pasting into a spreadsheet"
        onClick={() => void copy()}
      >
        Copy table
      </button>
    </div>
  );
}
