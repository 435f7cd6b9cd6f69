// The flux profile of the shown heat-exchange results: the local net flux
// around a tube split into arcs, or along a wall split into parts. Pure and
// keyed on the solved result, so a redraw does not rebuild it.
import { surfaceProfile, profileCsv, type Profile } from '../../document/exchange/profile';
import type { Shape } from '../sketchFile';
import type { ExchangeSolved } from './slice';

export type { Profile, ProfileRow } from '../../document/exchange/profile';

const numbered = /^(.*) (\d+)$/;
/** Arcs of a circle may end in any word ("tube 4 a"). */
const worded = /^(.*) (\S+)$/;

/**
 * Names that have a profile: a surface split into numbered parts ("tube 3 1",
 * "tube 3 2"... gives "tube 3"; arcs of a circle may end in any word), at
 * least two parts on one shape, in shape order.
 */
export function profileChoices(shapes: readonly Shape[]): string[] {
  const out: string[] = [];
  for (const shape of shapes) {
    if (typeof shape.surface === 'string') continue;
    const count = new Map<string, number>();
    for (const n of shape.surface) {
      const m = (shape.circle ? worded : numbered).exec(n);
      if (m) count.set(m[1], (count.get(m[1]) ?? 0) + 1);
    }
    for (const [base, k] of count) if (k >= 2 && !out.includes(base)) out.push(base);
  }
  return out;
}

let last: {
  result: ExchangeSolved;
  shapes: readonly Shape[];
  name: string;
  out: Profile | { problem: string };
} | null = null;

/** The profile of `name` from solved results (net flux per surface, W/m^2), or why there is none. */
export function exchangeProfile(
  ex: ExchangeSolved,
  shapes: readonly Shape[],
  name: string,
): Profile | { problem: string } {
  if (last && last.result === ex && last.shapes === shapes && last.name === name) return last.out;
  const index = new Map(ex.names.map((n, i) => [n, i]));
  const out = surfaceProfile(shapes, name, (surface) => {
    const i = index.get(surface);
    return i === undefined ? undefined : ex.result.netFlux[i];
  });
  last = { result: ex, shapes, name, out };
  return out;
}

/** The profile as CSV (the command line's `exchange FILE --profile NAME`). */
export function profileCsvText(p: Profile, units: string): string {
  return profileCsv(p, units);
}
