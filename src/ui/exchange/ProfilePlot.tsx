import type { Profile } from '../../state/exchange/profile';
import { fmtHeat } from './format';

const WIDTH = 420;
const HEIGHT = 180;
/** Margins, px: room for the flux labels on the left and the angle labels below. */
const LEFT = 64;
const RIGHT = 12;
const TOP = 10;
const BOTTOM = 30;

/**
 * Local net flux against angle (0° at +x, anticlockwise; 0° and every 90°
 * marked) or against position along a wall, with the mean as a dashed line and
 * the peak ringed. The zero line is drawn when the fluxes change sign.
 */
export function ProfilePlot({
  p,
  units,
  facing,
}: {
  p: Profile;
  units: string;
  /** Angle (degrees from +x) towards a chosen surface, marked on an angle plot. */
  facing?: { angle: number; name: string } | null;
}) {
  const angle = p.along === 'angle';
  const span = angle ? 360 : p.rows.reduce((t, r) => t + r.length, 0);
  let lo = Math.min(0, ...p.rows.map((r) => r.flux));
  let hi = Math.max(0, ...p.rows.map((r) => r.flux));
  if (lo === hi) {
    lo -= 1;
    hi += 1;
  }
  const x = (at: number) => LEFT + ((WIDTH - LEFT - RIGHT) * at) / span;
  const y = (q: number) => TOP + ((HEIGHT - TOP - BOTTOM) * (hi - q)) / (hi - lo);
  const ticks = angle ? [0, 90, 180, 270, 360] : [0, span / 2, span];
  const points = p.rows.map((r) => `${x(r.at)},${y(r.flux)}`).join(' ');
  const peak = p.rows.find((r) => r.at === p.peakAt);
  return (
    <svg
      className="profile-plot"
      viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
      width={WIDTH}
      height={HEIGHT}
      role="img"
      aria-label={`Net flux against ${angle ? 'angle from +x, anticlockwise' : `position along the wall (${units})`}`}
    >
      <line x1={LEFT} x2={WIDTH - RIGHT} y1={y(0)} y2={y(0)} stroke="#888" strokeWidth={1} />
      <line x1={LEFT} x2={WIDTH - RIGHT} y1={y(p.average)} y2={y(p.average)} stroke="#555" strokeDasharray="5 4" />
      {ticks.map((t) => (
        <g key={t}>
          <line x1={x(t)} x2={x(t)} y1={TOP} y2={HEIGHT - BOTTOM} stroke={t === 0 ? '#333' : '#ddd'} />
          <text x={x(t)} y={HEIGHT - BOTTOM + 14} fontSize={11} textAnchor="middle">
            {angle ? `${t}°` : fmtHeat(t)}
          </text>
        </g>
      ))}
      <text x={LEFT - 4} y={y(hi) + 4} fontSize={10} textAnchor="end">
        {fmtHeat(hi)}
      </text>
      <text x={LEFT - 4} y={y(lo)} fontSize={10} textAnchor="end">
        {fmtHeat(lo)}
      </text>
      <text x={(LEFT + WIDTH) / 2} y={HEIGHT - 3} fontSize={10} textAnchor="middle">
        {angle ? 'angle from +x, anticlockwise (0° = +x side)' : `position along the wall (${units})`}
      </text>
      {angle && facing && (
        <g>
          <line x1={x(facing.angle)} x2={x(facing.angle)} y1={TOP} y2={HEIGHT - BOTTOM} stroke="#2b6cb5" />
          <text x={x(facing.angle) + 3} y={TOP + 10} fontSize={10} fill="#2b6cb5">
            {`faces ${facing.name}`}
          </text>
        </g>
      )}
      <polyline points={points} fill="none" stroke="#b5452b" strokeWidth={2} />
      {p.rows.map((r) => (
        <circle key={r.surface} cx={x(r.at)} cy={y(r.flux)} r={2.5} fill="#b5452b">
          <title>{`${r.surface}: ${fmtHeat(r.flux)} W/m²`}</title>
        </circle>
      ))}
      {peak && <circle cx={x(peak.at)} cy={y(peak.flux)} r={6} fill="none" stroke="#1d2b36" strokeWidth={1.5} />}
    </svg>
  );
}
