// The exchange stage of the results pipeline: the gray-diffuse solve for what
// is on screen, keyed on the surface factors and the properties that go with
// them (a property edit re-solves; it never needs new view factors). The solve
// itself is solveJob.ts, run here or, for large sketches, in the exchange's
// worker (live.ts, background.ts), whose answer is filed in the same cache.
import type { ShownResult } from '../results/derive';
import type { ExchangeView } from './slice';
import { exchangeJob, solveExchangeJob, type SolvedView } from './solveJob';

let last: { key: unknown[]; view: SolvedView } | null = null;

/** What a solve depends on: the shown factors, names, units, properties and settings. */
export const exchangeKey = (shown: ShownResult): unknown[] => [
  shown.result,
  shown.names,
  shown.units,
  shown.sketch.surfaces,
  shown.sketch.settings,
];

/** Do two keys name the same solve (every part the same object)? */
export function sameExchangeKey(a: unknown[], b: unknown[]): boolean {
  return a.length === b.length && a.every((v, i) => v === b[i]);
}

const sameKey = (key: unknown[]): boolean => last !== null && sameExchangeKey(key, last.key);

/** Solve the exchange for the shown view factors (or take the solve filed for them); messages instead of exceptions. */
export function deriveExchange(shown: ShownResult | null): ExchangeView {
  if (!shown) return { kind: 'none' };
  const key = exchangeKey(shown);
  const filed =
    last !== null && sameKey(key) ? last : (last = { key, view: solveExchangeJob(exchangeJob(shown), shown.stale) });
  return filed.view.stale === shown.stale ? filed.view : { ...filed.view, stale: shown.stale };
}

/** Is the solve for these shown factors and properties filed already? */
export function exchangeKnown(shown: ShownResult): boolean {
  return sameKey(exchangeKey(shown));
}

/** File a solve made elsewhere (the exchange's worker) for these shown factors and properties. */
export function fileExchange(shown: ShownResult, view: SolvedView): void {
  last = { key: exchangeKey(shown), view };
}
