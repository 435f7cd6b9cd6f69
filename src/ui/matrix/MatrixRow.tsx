import { memo } from 'react';
import type { MatrixView } from '../../state/matrixView';
import { RESIDUAL_TOLERANCE } from '../../state/matrixView';
import { surfaceStyle } from '../palette';
import { fmtFactor, fmtLength, fmtResidual } from './format';

/** Columns [start, end) drawn, and the width (px) left out on each side of them (a windowed table). */
export interface ColumnWindow {
  start: number;
  end: number;
  before: number;
  after: number;
}

export function Swatch({ index }: { index: number }) {
  const st = surfaceStyle(index);
  return (
    <span
      className={`swatch${st.dash ? ' dashed' : ''}`}
      style={{ background: st.colour, borderColor: st.colour }}
      aria-hidden="true"
    />
  );
}

/** A blank cell standing for the columns a windowed table leaves out. */
/** Stands for the rows a windowed table leaves out above or below the drawn ones. */
export function Spacer({ px }: { px: number }) {
  if (px <= 0) return null;
  return (
    <tr role="presentation" aria-hidden="true">
      <td style={{ height: px, padding: 0, border: 0 }} />
    </tr>
  );
}

export function Gap({ px, head }: { px: number; head?: boolean }) {
  if (px <= 0) return null;
  const style = { width: px, minWidth: px, maxWidth: px, padding: 0 };
  return head ? (
    <th role="presentation" aria-hidden="true" style={style} />
  ) : (
    <td role="presentation" aria-hidden="true" style={style} />
  );
}

interface RowProps {
  view: MatrixView;
  i: number;
  digits: number;
  /** Colour slot of this row's surface. */
  colour: number;
  cols: ColumnWindow;
  rowOn: boolean;
  /** Columns marked for the selection or the hovered pair (the same Set while they stay). */
  colsOn: ReadonlySet<number>;
  /** Column of the hovered cell in this row, or -1. */
  hot: number;
  onHover: (pair: [string, string] | null) => void;
  /** 1-based aria-rowindex in a windowed table. */
  ariaRow?: number;
}

/** One row of the view-factor matrix; re-renders only when its own inputs change. */
export const MatrixRow = memo(function MatrixRow({
  view,
  i,
  digits,
  colour,
  cols,
  rowOn,
  colsOn,
  hot,
  onHover,
  ariaRow,
}: RowProps) {
  const from = view.names[i];
  const row = view.rows[i];
  const res = view.rowResidual[i];
  const resBad = view.closed && Math.abs(res) > RESIDUAL_TOLERANCE;
  const cells = [];
  for (let j = cols.start; j < cols.end; j++) {
    const f = row[j];
    const to = view.names[j];
    const bad = view.pairResidual(i, j) > RESIDUAL_TOLERANCE;
    const cls = ['num', 'cell', bad && 'recip-bad', colsOn.has(j) && 'col-on', hot === j && 'hot']
      .filter(Boolean)
      .join(' ');
    cells.push(
      <td
        key={j}
        className={cls}
        tabIndex={0}
        aria-colindex={ariaRow === undefined ? undefined : j + 3}
        title={`F from ${from} to ${to} = ${f}${bad ? ` (reciprocity residual ${fmtResidual(view.pairResidual(i, j))})` : ''}`}
        onMouseEnter={() => onHover([from, to])}
        onFocus={() => onHover([from, to])}
        onBlur={() => onHover(null)}
      >
        {fmtFactor(f, digits)}
        {bad ? ' ⚠' : ''}
      </td>,
    );
  }
  const n = view.names.length;
  return (
    <tr className={rowOn ? 'on' : undefined} aria-rowindex={ariaRow}>
      <th scope="row" title={from} aria-colindex={ariaRow === undefined ? undefined : 1}>
        <span className="row-no" aria-hidden="true">
          {i + 1}
        </span>
        <Swatch index={colour} />
        <span className="name">{from}</span>
      </th>
      <td className="num" aria-colindex={ariaRow === undefined ? undefined : 2}>
        {fmtLength(view.lengths[i])}
      </td>
      <Gap px={cols.before} />
      {cells}
      <Gap px={cols.after} />
      <td
        className={`num${resBad ? ' warn' : ''}`}
        title={String(res)}
        aria-colindex={ariaRow === undefined ? undefined : n + 3}
      >
        {view.closed ? fmtResidual(res) : fmtFactor(res, digits)}
      </td>
    </tr>
  );
});
