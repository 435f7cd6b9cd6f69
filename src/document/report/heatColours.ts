// Heat colours for pictures of a sketch: a diverging scale, cool blue through a
// warm grey to burnt orange (blue against orange stays apart for red-green
// colour blindness; lightness rises from both ends to the middle, so it also
// reads in grey). The app's canvas colouring uses this scale too (src/state/exchange/heatColours.ts).
import type { ExchangeResult } from '../../core/exchange';

/** sRGB stops at t = 0, 0.25, 0.5, 0.75, 1. */
export const HEAT_STOPS: ReadonlyArray<readonly [number, number, number]> = [
  [33, 62, 138],
  [108, 156, 210],
  [238, 234, 224],
  [236, 159, 86],
  [138, 56, 12],
];

/** Colour at t in [0, 1] (clamped; not a number: the middle) as #rrggbb. */
export function heatColour(t: number): string {
  const x = Math.min(1, Math.max(0, Number.isFinite(t) ? t : 0.5)) * (HEAT_STOPS.length - 1);
  const k = Math.min(HEAT_STOPS.length - 2, Math.floor(x));
  const f = x - k;
  const hex = HEAT_STOPS[k].map((a, c) =>
    Math.round(a + f * (HEAT_STOPS[k + 1][c] - a))
      .toString(16)
      .padStart(2, '0'),
  );
  return `#${hex.join('')}`;
}

export type HeatQuantity = 'netFlux' | 'temperature';

/** A colouring of surfaces by one result, with what its legend shows. */
export interface HeatColours {
  /** Legend title with its unit. */
  title: string;
  /** Legend values at the low end, the centre and the high end (in the title's unit). */
  low: number;
  centre: number;
  high: number;
  /** Colour of each surface, in the order of the result. */
  colours: string[];
}

/**
 * Colours per surface: net flux (W/m^2) centred on zero, scaled by the largest
 * |flux| (blue takes heat up, orange gives heat off); or temperature (K, or
 * degrees Celsius with `celsius`) over its range. A spread below rounding is
 * one temperature: every surface at the centre.
 */
export function heatColours(
  quantity: HeatQuantity,
  result: Pick<ExchangeResult, 'surfaceCount' | 'netFlux' | 'temperature'>,
  celsius = false,
): HeatColours {
  const n = result.surfaceCount;
  if (n === 0) return { title: '', low: 0, centre: 0, high: 0, colours: [] };
  if (quantity === 'netFlux') {
    const q = result.netFlux;
    let largest = 0;
    for (let i = 0; i < n; i++) largest = Math.max(largest, Math.abs(q[i]));
    const colours = Array.from(q.subarray(0, n), (v) => heatColour(largest > 0 ? 0.5 + (0.5 * v) / largest : 0.5));
    return { title: 'Net flux, W/m² (> 0 gives heat off)', low: -largest, centre: 0, high: largest, colours };
  }
  const T = result.temperature;
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < n; i++) {
    lo = Math.min(lo, T[i]);
    hi = Math.max(hi, T[i]);
  }
  const span = hi - lo;
  const flat = !(span > 1e-9 * hi);
  const colours = Array.from(T.subarray(0, n), (v) => heatColour(flat ? 0.5 : (v - lo) / span));
  // 0 degrees Celsius = 273.15 K (exact by definition); rounded to 12 digits so 1273.15 K shows as 1000.
  const shown = (k: number) => (celsius ? Number((k - 273.15).toPrecision(12)) : k);
  return {
    title: celsius ? 'Temperature, °C' : 'Temperature, K',
    low: shown(lo),
    centre: shown((lo + hi) / 2),
    high: shown(hi),
    colours,
  };
}
