import { memo } from 'react';
import type { MatrixView } from '../../state/matrixView';
import { RESIDUAL_TOLERANCE } from '../../state/matrixView';
import { surfaceStyle } from '../palette';
import { fmtFactor, fmtLength, fmtResidual } from './format';

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

function Swatch({ index }: { index: number }) {
  const st = surfaceStyle(index);
  return (
    <span
      className={`swatch${st.dash ? ' dashed' : ''}`}
      style={{ background: st.colour, borderColor: st.colour }}
      aria-hidden="true"
    />
  );
}

/** The view-factor matrix: row = from, column = to; names are rendered as text. */
export const MatrixTable = memo(function MatrixTable({
  view,
  digits,
  units,
  order,
  selected,
  hoverPair,
  onHover,
  stale,
}: Props) {
  const n = view.names.length;
  const residualHead = view.closed ? '1 − Σ' : 'to surr.';
  return (
    <table
      className={`matrix${stale ? ' stale' : ''}`}
      aria-describedby="matrix-notes"
      onMouseLeave={() => onHover(null)}
    >
      <caption>View factor matrix F (row = from, column = to)</caption>
      <thead>
        <tr>
          <th scope="col" className="corner">
            from \ to
          </th>
          <th scope="col" title={`Surface length per unit depth, ${units}`}>
            L ({units})
          </th>
          {view.names.map((name, j) => (
            <th key={j} scope="col" className={colClass(name, selected, hoverPair, 1)} title={`to ${name}`}>
              {/* Columns are numbered to keep the table narrow; the number matches the row. */}
              <Swatch index={order.get(name) ?? j} />
              <span aria-hidden="true">{j + 1}</span>
              <span className="sr-only">{name}</span>
            </th>
          ))}
          <th
            scope="col"
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
        {view.rows.map((row, i) => {
          const from = view.names[i];
          const rowOn = selected.has(from) || hoverPair?.[0] === from;
          const res = view.rowResidual[i];
          const resBad = view.closed && Math.abs(res) > RESIDUAL_TOLERANCE;
          return (
            <tr key={i} className={rowOn ? 'on' : undefined}>
              <th scope="row" title={from}>
                <span className="row-no" aria-hidden="true">
                  {i + 1}
                </span>
                <Swatch index={order.get(from) ?? i} />
                <span className="name">{from}</span>
              </th>
              <td className="num">{fmtLength(view.lengths[i])}</td>
              {row.map((f, j) => {
                const to = view.names[j];
                const bad = view.pairResidual[i][j] > RESIDUAL_TOLERANCE;
                const cls = [
                  'num',
                  'cell',
                  bad && 'recip-bad',
                  (selected.has(to) || hoverPair?.[1] === to) && 'col-on',
                  hoverPair?.[0] === from && hoverPair?.[1] === to && 'hot',
                ]
                  .filter(Boolean)
                  .join(' ');
                return (
                  <td
                    key={j}
                    className={cls}
                    tabIndex={0}
                    title={`F from ${from} to ${to} = ${f}${bad ? ` (reciprocity residual ${fmtResidual(view.pairResidual[i][j])})` : ''}`}
                    onMouseEnter={() => onHover([from, to])}
                    onFocus={() => onHover([from, to])}
                    onBlur={() => onHover(null)}
                  >
                    {fmtFactor(f, digits)}
                    {bad ? ' ⚠' : ''}
                  </td>
                );
              })}
              <td className={`num${resBad ? ' warn' : ''}`} title={String(res)}>
                {view.closed ? fmtResidual(res) : fmtFactor(res, digits)}
              </td>
            </tr>
          );
        })}
        {n === 0 && (
          <tr>
            <td colSpan={3}>No surfaces.</td>
          </tr>
        )}
      </tbody>
    </table>
  );
});

function colClass(
  name: string,
  selected: Set<string>,
  hover: [string, string] | null,
  side: 0 | 1,
): string | undefined {
  return selected.has(name) || hover?.[side] === name ? 'col-on' : undefined;
}
