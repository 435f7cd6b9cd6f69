// Exports of the shown matrix: CSV (the command line's writer and content) and
// tab-separated text for the clipboard.
import { matrixCsv } from '../document';
import type { ShownResult } from './results/derive';
import type { MatrixView } from './matrixView';

/** CSV of a result: exactly what `npm run cli -- factors FILE --csv` prints for the same sketch. */
export function shownCsv(shown: ShownResult): string {
  return matrixCsv(shown.names.slice(0, shown.result.surfaceCount), shown.result.F);
}

/** Tab-separated copy for pasting into a spreadsheet; names neutralised like the CSV. */
export function matrixTsv(view: MatrixView, digits: number): string {
  const safe = (name: string) => {
    const flat = name.replace(/[\t\r\n]+/g, ' ');
    return /^[=+\-@\t\r]/.test(name) ? `'${flat}` : flat;
  };
  const head = ['from \\ to', ...view.names.map(safe)].join('\t');
  const body = view.rows.map((row, i) =>
    [safe(view.names[i]), ...Array.from(row, (f) => f.toFixed(digits))].join('\t'),
  );
  return [head, ...body].join('\n') + '\n';
}
