// The report's view-factor matrix, with row sums and the residuals, printed as
// `npm run cli -- factors FILE` prints them (six decimals).
import type { ViewFactorResult } from '../../core/scene';
import { SURROUNDINGS_LABEL } from '../exchange/labels';
import { fixed6, residual } from './format';
import { htmlTable, num, rowHead, text, type Cell } from './table';
import { escapeMarkup } from './escape';
import { MAX_MATRIX_SURFACES, matrixLeftOut } from './wording';

export function factorsSection(names: ReadonlyArray<string>, r: ViewFactorResult): string {
  const n = r.surfaceCount;
  const head: Cell[] = [text('from \\ to'), ...names.map(text)];
  if (!r.closed) head.push(text(SURROUNDINGS_LABEL.name));
  head.push(text('row sum'));
  const rows = () =>
    names.map((name, i) => {
      const row: Cell[] = [rowHead(name)];
      for (let j = 0; j < n; j++) row.push(num(fixed6(r.F[i * n + j]), r.F[i * n + j]));
      if (!r.closed) row.push(num(fixed6(r.rowSumResidual[i]), r.rowSumResidual[i]));
      // Sum over the surfaces only (1 - residual, as the command line's JSON gives it).
      const sum = 1 - r.rowSumResidual[i];
      row.push(num(fixed6(sum), sum));
      return row;
    });
  const table =
    n > MAX_MATRIX_SURFACES
      ? `<p class="note" data-left-out>${escapeMarkup(matrixLeftOut('view-factor matrix', n, 'npm run cli -- factors FILE --csv'))}</p>`
      : htmlTable({ name: 'view-factors', className: 'matrix', head, rows: rows(), rowKeys: names });
  const worst = Math.max(0, ...Array.from(r.rowSumResidual, Math.abs));
  const notes = [
    r.closed
      ? `Enclosure rule: largest |1 − row sum| = <span data-value="${worst}">${residual(worst)}</span>.`
      : `Open sketch (no enclosure): the ${SURROUNDINGS_LABEL.name} column is the factor to the surroundings, 1 − row sum.`,
    `Reciprocity: largest relative |L<sub>i</sub> F<sub>ij</sub> − L<sub>j</sub> F<sub>ji</sub>| = <span data-value="${r.reciprocityResidual}" data-name="reciprocity">${residual(r.reciprocityResidual)}</span>.`,
  ];
  return (
    `<section class="factors"><h2>View factors</h2>` +
    `<p class="note">F<sub>ij</sub>, dimensionless: row = from, column = to.</p>${table}` +
    `<p class="note">${notes.join(' ')}</p></section>`
  );
}
