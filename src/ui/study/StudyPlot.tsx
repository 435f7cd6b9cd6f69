// The line plot of a study: one line per chosen surface against the varied
// value, drawn as SVG with d3-scale's linear scales and tick choice.
import { scaleLinear } from 'd3-scale';
import { surfaceStyle } from '../palette';

const WIDTH = 420;
const HEIGHT = 220;
const MARGIN = { left: 62, right: 10, top: 10, bottom: 34 };

export interface PlotSeries {
  name: string;
  /** Index of the surface, for its colour (the canvas's colour for it). */
  index: number;
  y: number[];
}

interface Props {
  x: number[];
  xLabel: string;
  yLabel: string;
  series: PlotSeries[];
}

const tickText = (v: number) => String(Number(v.toPrecision(6)));

export function StudyPlot({ x, xLabel, yLabel, series }: Props) {
  if (x.length === 0 || series.length === 0) return <p className="hint">Choose at least one surface to plot.</p>;
  const ys = series.flatMap((s) => s.y);
  let [lo, hi] = [Math.min(...ys), Math.max(...ys)];
  if (lo === hi) [lo, hi] = [lo - 1, hi + 1]; // a flat line still gets an axis
  const sx = scaleLinear()
    .domain([Math.min(...x), Math.max(...x)])
    .range([MARGIN.left, WIDTH - MARGIN.right]);
  const sy = scaleLinear()
    .domain([lo, hi])
    .nice()
    .range([HEIGHT - MARGIN.bottom, MARGIN.top]);
  const path = (y: number[]) =>
    y.map((v, k) => `${k === 0 ? 'M' : 'L'}${sx(x[k]).toFixed(1)},${sy(v).toFixed(1)}`).join('');
  return (
    <figure className="study-plot">
      <svg
        viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
        width={WIDTH}
        height={HEIGHT}
        style={{ maxWidth: '100%', height: 'auto' }}
        role="img"
        aria-label={`Line plot of ${yLabel} against ${xLabel}`}
      >
        {sy.ticks(5).map((t) => (
          <g key={`y${t}`}>
            <line x1={MARGIN.left} x2={WIDTH - MARGIN.right} y1={sy(t)} y2={sy(t)} stroke="#e2e4e6" />
            <text x={MARGIN.left - 4} y={sy(t) + 4} textAnchor="end" fontSize={10}>
              {tickText(t)}
            </text>
          </g>
        ))}
        {sx.ticks(5).map((t) => (
          <text key={`x${t}`} x={sx(t)} y={HEIGHT - MARGIN.bottom + 14} textAnchor="middle" fontSize={10}>
            {tickText(t)}
          </text>
        ))}
        <line
          x1={MARGIN.left}
          x2={WIDTH - MARGIN.right}
          y1={HEIGHT - MARGIN.bottom}
          y2={HEIGHT - MARGIN.bottom}
          stroke="#6a747b"
        />
        <line x1={MARGIN.left} x2={MARGIN.left} y1={MARGIN.top} y2={HEIGHT - MARGIN.bottom} stroke="#6a747b" />
        <text x={(MARGIN.left + WIDTH - MARGIN.right) / 2} y={HEIGHT - 4} textAnchor="middle" fontSize={11}>
          {xLabel}
        </text>
        {series.map((s) => {
          const style = surfaceStyle(s.index);
          return (
            <path
              key={s.name}
              d={path(s.y)}
              fill="none"
              stroke={style.colour}
              strokeWidth={2}
              strokeDasharray={style.dash?.join(' ')}
            >
              <title>{s.name}</title>
            </path>
          );
        })}
      </svg>
      <figcaption>
        {yLabel}:{' '}
        {series.map((s) => (
          <span key={s.name} className="study-key" style={{ color: surfaceStyle(s.index).colour }}>
            ■ {s.name}{' '}
          </span>
        ))}
      </figcaption>
    </figure>
  );
}
