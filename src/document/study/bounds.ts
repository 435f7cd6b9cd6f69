// Lowest and highest net heat when emissivities are known only as ranges.
//
// Method: every corner of the box of ranges (each emissivity at its low or high
// end, 2^m cases, view factors computed once) is solved, and each surface's
// lowest and highest net heat over the corners is reported. This is exact when
// each net heat is monotone in each emissivity over the box (then its extremes
// lie at corners). As a check, the derivative of each net heat with respect to
// each ranged emissivity is worked out at every corner: where its sign differs
// between corners the result is not monotone and is flagged, because its true
// extreme may lie inside the box. No flag does not prove monotonicity between corners.
import type { ViewFactorResult } from '../../core/scene';
import { computeViewFactors } from '../../core/viewFactors';
import { solveSketchExchange } from '../exchangeInput';
import { formatNumber, quoteName } from '../labels';
import type { Sketch } from '../schema';
import { toScene } from '../toScene';
import { withParameterValue } from './apply';
import { parameterProblem } from './parameter';
import { sensitivityTable } from './sensitivity';

/** Most emissivity ranges at once: 2^12 = 4096 corner cases. */
export const MAX_RANGES = 12;

/** An emissivity known to lie in [low, high] (dimensionless, 0 < low <= high <= 1). */
export interface EmissivityRange {
  surface: string;
  low: number;
  high: number;
}

export interface EmissivityBounds {
  /** Corner cases solved (2^ranges). */
  corners: number;
  names: string[];
  /** Per surface, lowest and highest net heat over the corners, W per metre of depth. */
  low: number[];
  high: number[];
  /** Per surface: a derivative changed sign between corners, so the extremes may lie inside the box. */
  notMonotone: boolean[];
  /** Lowest and highest surroundings net heat (W per metre of depth), for an open sketch. */
  surroundings?: { low: number; high: number };
}

type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };

/** Read `SURFACE=LOW:HIGH` (split on the last '='). */
export function parseEmissivityRange(text: string): Parsed<EmissivityRange> {
  const eq = text.lastIndexOf('=');
  const parts = eq > 0 ? text.slice(eq + 1).split(':') : [];
  if (parts.length !== 2)
    return { ok: false, message: `'${text.slice(0, 40)}' is not SURFACE=LOW:HIGH (for example "crown=0.5:0.7")` };
  const [low, high] = parts.map((t) => (t.trim() === '' ? Number.NaN : Number(t)));
  if (!(low > 0 && high <= 1 && low <= high))
    return {
      ok: false,
      message: `the emissivity range of '${text.slice(0, eq).slice(0, 40)}' must have 0 < LOW <= HIGH <= 1`,
    };
  return { ok: true, value: { surface: text.slice(0, eq), low, high } };
}

/**
 * Lowest and highest net heat of every surface over the corners of the emissivity
 * ranges (see the file header). `factors`: the sketch's view factors when the
 * caller has them already (emissivities leave them as they are); else computed here.
 */
export function emissivityBounds(
  sketch: Sketch,
  ranges: readonly EmissivityRange[],
  factors?: ViewFactorResult,
): { ok: true; bounds: EmissivityBounds } | { ok: false; message: string } {
  if (ranges.length === 0) return { ok: false, message: 'give at least one emissivity range' };
  if (ranges.length > MAX_RANGES)
    return {
      ok: false,
      message: `at most ${MAX_RANGES} emissivity ranges (2^${MAX_RANGES} cases), got ${ranges.length}`,
    };
  const { scene, surfaceNames: names } = toScene(sketch);
  for (const r of ranges) {
    const problem = parameterProblem(sketch, names, { kind: 'surface', surface: r.surface, property: 'emissivity' });
    if (problem) return { ok: false, message: problem };
    if (ranges.filter((o) => o.surface === r.surface).length > 1)
      return { ok: false, message: `${quoteName(r.surface)} has more than one emissivity range` };
  }
  const viewFactors = factors ?? computeViewFactors(scene);
  const n = names.length;
  const low = new Array<number>(n).fill(Infinity);
  const high = new Array<number>(n).fill(-Infinity);
  const signs = ranges.map(() => new Array<number>(n).fill(0)); // sign seen so far per (range, surface)
  const notMonotone = new Array<boolean>(n).fill(false);
  let surroundings: { low: number; high: number } | undefined;
  const corners = 2 ** ranges.length;
  for (let corner = 0; corner < corners; corner++) {
    let edited = sketch;
    ranges.forEach((r, k) => {
      const value = corner & (1 << k) ? r.high : r.low;
      edited = withParameterValue(edited, { kind: 'surface', surface: r.surface, property: 'emissivity' }, value);
    });
    const solved = solveSketchExchange(edited, names, viewFactors);
    if (!solved.ok) {
      const at = ranges.map((r, k) => `${quoteName(r.surface)} ${formatNumber(corner & (1 << k) ? r.high : r.low)}`);
      return { ok: false, message: `with emissivities ${at.join(', ')}: ${solved.message}` };
    }
    const { result, input } = solved;
    for (let i = 0; i < n; i++) {
      low[i] = Math.min(low[i], result.netHeat[i]);
      high[i] = Math.max(high[i], result.netHeat[i]);
    }
    if (result.surroundingsViewFactor.some((f) => f > 0)) {
      const s = result.surroundingsNetHeat;
      surroundings = { low: Math.min(surroundings?.low ?? s, s), high: Math.max(surroundings?.high ?? s, s) };
    }
    const table = sensitivityTable(names, input, result);
    if (!table.ok) return table;
    ranges.forEach((r, k) => {
      const row = table.rows.find((t) => t.parameter === `${r.surface}.emissivity`);
      if (!row) return;
      // Derivatives below 1e-9 of the row's largest are rounding of a zero, not a sign.
      const scale = Math.max(...row.netHeat.map(Math.abs));
      row.netHeat.forEach((d, i) => {
        const sign = Math.abs(d) <= 1e-9 * scale ? 0 : Math.sign(d);
        if (sign !== 0 && signs[k][i] !== 0 && sign !== signs[k][i]) notMonotone[i] = true;
        if (sign !== 0) signs[k][i] = sign;
      });
    });
  }
  return { ok: true, bounds: { corners, names, low, high, notMonotone, ...(surroundings ? { surroundings } : {}) } };
}
