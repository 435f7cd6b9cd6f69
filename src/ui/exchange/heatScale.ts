// Colours for heat on the canvas: a diverging scale of our own, cool blue
// through a warm grey to burnt orange. Blue against orange stays apart for
// red-green colour blindness, and lightness rises from both ends to the middle,
// so the scale also reads in grey. Net flux is centred on zero (blue: takes heat
// up, orange: gives heat off); temperature on the middle of its range.
import type { ExchangeView, HeatColouring, TemperatureUnit } from '../../state/exchange/slice';
import { fromKelvin, TEMPERATURE_LABEL } from '../../state/exchange/units';
import { HEAT_STOPS as STOPS, heatColour } from '../../state/exchange/heatColours';

/** Colour at t in [0, 1] (clamped) as #rrggbb: the scale the pictures and the report use too. */
export const divergingColour = heatColour;

/** CSS gradient of the whole scale, for the legend. */
export const SCALE_GRADIENT = `linear-gradient(90deg, ${STOPS.map((s, i) => `rgb(${s.join(',')}) ${(100 * i) / (STOPS.length - 1)}%`).join(', ')})`;

export interface HeatScale {
  title: string;
  /** Legend labels at the low end, the centre and the high end, in display units. */
  low: number;
  centre: number;
  high: number;
  /** Colour of each surface by name; names without a result are absent. */
  colours: Map<string, string>;
}

/** The scale for the current colouring, or null when off or when there is nothing solved. */
export function heatScale(mode: HeatColouring, view: ExchangeView, unit: TemperatureUnit): HeatScale | null {
  if (mode === 'off' || view.kind !== 'solved') return null;
  const { names, result } = view;
  const colours = new Map<string, string>();
  if (mode === 'netFlux') {
    const q = result.netFlux;
    let largest = 0;
    for (const v of q) largest = Math.max(largest, Math.abs(v));
    names.forEach((n, i) => colours.set(n, divergingColour(largest > 0 ? 0.5 + (0.5 * q[i]) / largest : 0.5)));
    return { title: 'Net flux, W/m² (> 0 gives heat off)', low: -largest, centre: 0, high: largest, colours };
  }
  // 'inside': a wall's cold face or a tube's inner wall; NaN (other surfaces) leaves a surface uncoloured.
  const T =
    mode === 'inside'
      ? result.temperature.map((_, i) => {
          const cold = result.coldFaceTemperature[i];
          return Number.isNaN(cold) ? result.innerTemperature[i] : cold;
        })
      : result.temperature;
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of T) {
    if (Number.isNaN(v)) continue;
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  if (!(hi >= lo)) return null; // no wall or tube to colour
  const span = hi - lo;
  // A spread below rounding is one temperature: all at the centre.
  const flat = !(span > 1e-9 * hi);
  names.forEach((n, i) => {
    if (!Number.isNaN(T[i])) colours.set(n, divergingColour(flat ? 0.5 : (T[i] - lo) / span));
  });
  return {
    title: `${mode === 'inside' ? 'Cold face (walls) and inner wall (tubes)' : 'Temperature'}, ${TEMPERATURE_LABEL[unit]}`,
    low: fromKelvin(lo, unit),
    centre: fromKelvin((lo + hi) / 2, unit),
    high: fromKelvin(hi, unit),
    colours,
  };
}
