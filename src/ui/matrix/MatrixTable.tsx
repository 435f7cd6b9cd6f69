import { memo, useMemo, useRef, type Ref } from 'react';
import type { MatrixView } from '../../state/matrixView';
import { Gap, MatrixRow, Spacer, Swatch, type ColumnWindow } from './MatrixRow';
import { cellWidthPx, ROW_PX, useMatrixWindow, WINDOW_FROM } from './useMatrixWindow';

interface Props {
  view: MatrixView;
  digits: number;
  units: string;
  /** Colour index of each surface name on the canvas. */
  order: ReadonlyMap<string, number>;
  selected: Set<string>;
  hoverPair: [string, string] | null;
  onHover: (pair: [string, string] | null) => void;
  stale: boolean;
}

/**
 * The view-factor matrix: row = from, column = to; names are rendered as text.
 * Above WINDOW_FROM surfaces only the rows and columns in view are in the
 * document (with aria-rowcount / aria-colcount and each drawn cell's index).
 */
export const MatrixTable = memo(function MatrixTable(props: Props) {
  return props.view.names.length > WINDOW_FROM ? <WindowedMatrix {...props} /> : <Matrix {...props} />;
});

function Matrix(props: Props) {
  const n = props.view.names.length;
  const rows = useMemo(() => Array.from({ length: n }, (_, i) => i), [n]);
  const cols = useMemo<ColumnWindow>(() => ({ start: 0, end: n, before: 0, after: 0 }), [n]);
  return <MatrixGrid {...props} rows={rows} cols={cols} />;
}

function WindowedMatrix(props: Props) {
  const scroll = useRef<HTMLTableElement>(null);
  const win = useMatrixWindow(
    scroll,
    props.view.names.length,
    props.view.names.length,
    cellWidthPx(props.digits),
    props.view,
  );
  return <MatrixGrid {...props} tableRef={scroll} rows={win.rows} cols={win.cols} pad={win.pad} windowed />;
}

interface GridProps extends Props {
  rows: readonly number[];
  cols: ColumnWindow;
  /** Height (px) of the rows left out above and below. */
  pad?: { before: number; after: number };
  windowed?: boolean;
  tableRef?: Ref<HTMLTableElement>;
}

function MatrixGrid({
  view,
  digits,
  units,
  order,
  selected,
  hoverPair,
  onHover,
  stale,
  rows,
  cols,
  pad,
  windowed,
  tableRef,
}: GridProps) {
  const n = view.names.length;
  const residualHead = view.closed ? '1 − Σ' : 'to surr.';
  const hoverTo = hoverPair?.[1] ?? null;
  // The same Set while the selection and the hovered column stay, so rows that did not change skip rendering.
  const colsOn = useMemo(() => {
    const on = new Set<number>();
    view.names.forEach((name, j) => {
      if (selected.has(name) || hoverTo === name) on.add(j);
    });
    return on;
  }, [view.names, selected, hoverTo]);
  const aria = (k: number) => (windowed ? k : undefined);
  const heads = [];
  for (let j = cols.start; j < cols.end; j++) {
    const name = view.names[j];
    heads.push(
      <th
        key={j}
        scope="col"
        className={[windowed && 'vcol', colsOn.has(j) && 'col-on'].filter(Boolean).join(' ') || undefined}
        title={`to ${name}`}
        aria-colindex={aria(j + 3)}
      >
        {/* Columns are numbered to keep the table narrow; the number matches the row. */}
        <Swatch index={order.get(name) ?? j} />
        <span aria-hidden="true">{j + 1}</span>
        <span className="sr-only">{name}</span>
      </th>,
    );
  }
  return (
    <table
      ref={tableRef}
      className={`matrix${stale ? ' stale' : ''}${windowed ? ' windowed' : ''}`}
      aria-describedby="matrix-notes"
      aria-rowcount={aria(n + 1)}
      aria-colcount={aria(n + 3)}
      style={windowed ? ({ '--cell-px': `${cellWidthPx(digits)}px`, '--row-px': `${ROW_PX}px` } as object) : undefined}
      onMouseLeave={() => onHover(null)}
    >
      <caption>View factor matrix F (row = from, column = to)</caption>
      <thead>
        <tr aria-rowindex={aria(1)}>
          <th scope="col" className="corner" aria-colindex={aria(1)}>
            from \ to
          </th>
          <th scope="col" title={`Surface length per unit depth, ${units}`} aria-colindex={aria(2)}>
            L ({units})
          </th>
          <Gap px={cols.before} head />
          {heads}
          <Gap px={cols.after} head />
          <th
            scope="col"
            aria-colindex={aria(n + 3)}
            title={
              view.closed
                ? 'Row-sum residual: 1 minus the sum of the row (should be 0 to rounding)'
                : 'Open sketch: 1 minus the row sum is the factor to the surroundings'
            }
          >
            {residualHead}
          </th>
        </tr>
      </thead>
      <tbody>
        {pad && <Spacer px={pad.before} />}
        {rows.map((i) => {
          const from = view.names[i];
          return (
            <MatrixRow
              key={i}
              view={view}
              i={i}
              digits={digits}
              colour={order.get(from) ?? i}
              cols={cols}
              rowOn={selected.has(from) || hoverPair?.[0] === from}
              colsOn={colsOn}
              hot={hoverPair?.[0] === from && hoverTo !== null ? view.names.indexOf(hoverTo) : -1}
              onHover={onHover}
              ariaRow={aria(i + 2)}
            />
          );
        })}
        {pad && <Spacer px={pad.after} />}
        {n === 0 && (
          <tr>
            <td colSpan={3}>No surfaces.</td>
          </tr>
        )}
      </tbody>
    </table>
  );
}
