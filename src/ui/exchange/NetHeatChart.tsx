import type { ExchangeSolved } from '../../state/exchange/slice';
import { divergingColour } from './heatScale';
import { fmtHeat } from './format';
import { exchangeRows } from './rows';

/** Above this many surfaces only this many bars are drawn: those with the largest net heat in size, largest first. */
export const CHART_SURFACES = 40;
const ROW = 18;
const WIDTH = 420;
const LABEL = 120;
const VALUE = 64;

/**
 * Net heat per surface as horizontal bars from a zero line: right (orange) for
 * surfaces that give heat off, left (blue) for those that take it up. Sign is
 * carried by direction and the printed value as well as by colour.
 */
export function NetHeatChart({ ex }: { ex: ExchangeSolved }) {
  // Net radiation only: the gas row has none.
  const all = exchangeRows(ex).flatMap((r) => (r.netHeat === undefined ? [] : [{ ...r, netHeat: r.netHeat }]));
  // A bar per surface stops being readable long before a thousand (and costs a redraw of each after every edit).
  const rows =
    all.length > CHART_SURFACES
      ? [...all].sort((a, b) => Math.abs(b.netHeat) - Math.abs(a.netHeat)).slice(0, CHART_SURFACES)
      : all;
  let largest = 0;
  for (const r of rows) largest = Math.max(largest, Math.abs(r.netHeat));
  const plot = WIDTH - LABEL - VALUE;
  const zero = LABEL + plot / 2;
  const height = rows.length * ROW + 8;
  return (
    <figure className="net-heat-chart">
      <figcaption>
        Net radiation per surface, W per metre of depth
        {rows.length < all.length ? `: the ${rows.length} largest in size of ${all.length}, largest first` : ''}
      </figcaption>
      <svg
        viewBox={`0 0 ${WIDTH} ${height}`}
        width={WIDTH}
        height={height}
        style={{ maxWidth: '100%', height: 'auto' }}
        role="img"
        aria-label="Bar chart of net heat per surface, W per metre of depth"
      >
        <line x1={zero} x2={zero} y1={0} y2={height} stroke="#6a747b" strokeWidth={1} />
        {rows.map((r, k) => {
          const w = largest > 0 ? ((plot / 2) * Math.abs(r.netHeat)) / largest : 0;
          const y = 4 + k * ROW;
          const x = r.netHeat >= 0 ? zero : zero - w;
          const name = r.name.length > 16 ? `${r.name.slice(0, 15)}…` : r.name;
          return (
            <g key={r.name} data-surface={r.name}>
              <title>{`${r.name}: ${fmtHeat(r.netHeat)} W/m`}</title>
              <text x={LABEL - 6} y={y + ROW / 2 + 4} textAnchor="end" fontSize={11}>
                {name}
              </text>
              <rect
                x={x}
                y={y + 2}
                width={Math.max(w, 0.5)}
                height={ROW - 5}
                fill={divergingColour(r.netHeat >= 0 ? 0.9 : 0.1)}
                data-value={r.netHeat}
              />
              <text x={WIDTH - 4} y={y + ROW / 2 + 4} textAnchor="end" fontSize={11}>
                {fmtHeat(r.netHeat)}
              </text>
            </g>
          );
        })}
      </svg>
    </figure>
  );
}
