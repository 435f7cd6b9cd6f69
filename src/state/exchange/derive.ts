// The exchange stage of the results pipeline: the gray-diffuse solve for what
// is on screen, keyed on the surface factors and the properties that go with
// them (a property edit re-solves; it never needs new view factors).
import { solveSketchExchange } from '../../document/exchangeInput';
import type { ShownResult } from '../results/derive';
import type { ExchangeView } from './slice';

type Solve = Exclude<ExchangeView, { kind: 'none' }>;
let last: { key: unknown[]; view: Solve } | null = null;

/** Solve the exchange for the shown view factors; messages instead of exceptions. */
export function deriveExchange(shown: ShownResult | null): ExchangeView {
  if (!shown) return { kind: 'none' };
  const { sketch } = shown;
  const key = [shown.result, shown.names, shown.units, sketch.surfaces, sketch.settings];
  if (!last || key.length !== last.key.length || key.some((v, i) => v !== last?.key[i])) {
    last = { key, view: solve(shown) };
  }
  return last.view.stale === shown.stale ? last.view : { ...last.view, stale: shown.stale };
}

function solve(shown: ShownResult): Solve {
  // Lengths are in the units of the geometry the factors belong to.
  const part = { units: shown.units, surfaces: shown.sketch.surfaces, settings: shown.sketch.settings };
  const names = [...shown.names];
  const outcome = solveSketchExchange(part, names, shown.result);
  if (!outcome.ok) {
    const surface = outcome.surface === undefined ? undefined : names[outcome.surface];
    return { kind: 'error', message: outcome.message, surface, stale: shown.stale };
  }
  return {
    kind: 'solved',
    names,
    lengths: shown.result.surfaceLength,
    units: shown.units,
    conditions: [...outcome.input.conditions],
    result: outcome.result,
    stale: shown.stale,
  };
}
