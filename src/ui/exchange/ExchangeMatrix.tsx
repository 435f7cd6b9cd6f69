// The net exchange matrix q'_ij beside the net heat table. Above WINDOW_FROM
// surfaces only the rows and columns in view are drawn (as the view-factor matrix).
import { useRef, type Ref } from 'react';
import type { ExchangeSolved } from '../../state/exchange/slice';
import { exchangeMatrixRows } from '../../state/exchange/tables';
import { Gap, Spacer, type ColumnWindow } from '../matrix/MatrixRow';
import { useMatrixWindow, WINDOW_FROM } from '../matrix/useMatrixWindow';
import { fmtHeat } from './format';

/** Width of a windowed heat cell, px: about 10 figures, sign and exponent, at 7 px each, and padding. */
const HEAT_CELL_PX = 96;

interface Props {
  ex: ExchangeSolved;
  labelledBy: string;
}

export function ExchangeMatrix(props: Props) {
  return exchangeMatrixRows(props.ex).names.length > WINDOW_FROM ? <Windowed {...props} /> : <Grid {...props} />;
}

function Windowed(props: Props) {
  const ref = useRef<HTMLTableElement>(null);
  const m = exchangeMatrixRows(props.ex);
  const win = useMatrixWindow(ref, m.names.length, m.columns.length, HEAT_CELL_PX, m, 1);
  return <Grid {...props} tableRef={ref} rows={win.rows} cols={win.cols} pad={win.pad} />;
}

function Grid({
  ex,
  labelledBy,
  tableRef,
  rows,
  cols,
  pad,
}: Props & {
  tableRef?: Ref<HTMLTableElement>;
  rows?: number[];
  cols?: ColumnWindow;
  pad?: { before: number; after: number };
}) {
  const matrix = exchangeMatrixRows(ex);
  const windowed = rows !== undefined;
  const shownCols = cols ?? { start: 0, end: matrix.columns.length, before: 0, after: 0 };
  const aria = (k: number) => (windowed ? k : undefined);
  const colRange = Array.from({ length: Math.max(0, shownCols.end - shownCols.start) }, (_, k) => shownCols.start + k);
  return (
    <div className={`matrix-scroll exchange-scroll${windowed ? ' windowed' : ''}`}>
      <table
        ref={tableRef}
        className={`matrix exchange-matrix${ex.stale ? ' stale' : ''}${windowed ? ' windowed' : ''}`}
        aria-labelledby={labelledBy}
        aria-rowcount={aria(matrix.names.length + 1)}
        aria-colcount={aria(matrix.columns.length + 1)}
        style={windowed ? ({ '--cell-px': `${HEAT_CELL_PX}px`, '--row-px': '22px' } as object) : undefined}
      >
        <thead>
          <tr aria-rowindex={aria(1)}>
            <th scope="col" aria-colindex={aria(1)}>
              from \ to
            </th>
            <Gap px={shownCols.before} head />
            {colRange.map((j) => (
              <th key={j} scope="col" className={windowed ? 'vcol' : undefined} aria-colindex={aria(j + 2)}>
                {matrix.columns[j]}
              </th>
            ))}
            <Gap px={shownCols.after} head />
          </tr>
        </thead>
        <tbody>
          {pad && <Spacer px={pad.before} />}
          {(rows ?? matrix.names.map((_, i) => i)).map((i) => (
            <tr key={matrix.names[i]} data-surface={matrix.names[i]} aria-rowindex={aria(i + 2)}>
              <th scope="row" aria-colindex={aria(1)}>
                {matrix.names[i]}
              </th>
              <Gap px={shownCols.before} />
              {colRange.map((j) => (
                <td
                  key={j}
                  className={windowed ? 'num cell' : 'num'}
                  data-value={matrix.at(i, j)}
                  aria-colindex={aria(j + 2)}
                >
                  {fmtHeat(matrix.at(i, j))}
                </td>
              ))}
              <Gap px={shownCols.after} />
            </tr>
          ))}
          {pad && <Spacer px={pad.after} />}
        </tbody>
      </table>
    </div>
  );
}
