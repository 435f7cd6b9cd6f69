// The flux profile of the shown heat-exchange results: the local net flux
// around a tube split into arcs, or along a wall split into parts. Pure and
// keyed on the solved result, so a redraw does not rebuild it.
import { surfaceProfile, profileCsv, type Profile } from '../../document/exchange/profile';
import type { Shape } from '../sketchFile';
import { edgeNames } from '../geometry/polygon';
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
  const r = ex.result;
  const out = surfaceProfile(
    shapes,
    name,
    (surface) => {
      const i = index.get(surface);
      return i === undefined ? undefined : r.netFlux[i];
    },
    (surface) => {
      const i = index.get(surface);
      return i === undefined ? undefined : { temperature: r.temperature[i], innerTemperature: r.innerTemperature?.[i] };
    },
  );
  last = { result: ex, shapes, name, out };
  return out;
}

/** The profile as CSV (the command line's `exchange FILE --profile NAME`). */
export function profileCsvText(p: Profile, units: string): string {
  return profileCsv(p, units);
}

/**
 * The direction from a circle's centre to surface `name`, degrees anticlockwise
 * from +x in [0, 360): towards the length-weighted middle of the surface's edges
 * and arcs (an arc counts at its middle). Null when shape `circle` is not a
 * circle or no other shape has the surface.
 */
export function facingAngle(shapes: readonly Shape[], circle: number, name: string): number | null {
  const c = shapes[circle]?.circle;
  if (!c) return null;
  let sx = 0;
  let sy = 0;
  let total = 0;
  shapes.forEach((shape, s) => {
    if (s === circle) return;
    const names = edgeNames(shape);
    if (shape.circle) {
      const { center, radius } = shape.circle;
      const n = names.length;
      names.forEach((m, k) => {
        if (m !== name) return;
        const a = ((k + 0.5) * 2 * Math.PI) / n;
        const len = (2 * Math.PI * radius) / n;
        sx += len * (center[0] + radius * Math.cos(a));
        sy += len * (center[1] + radius * Math.sin(a));
        total += len;
      });
      return;
    }
    names.forEach((m, k) => {
      if (m !== name) return;
      const a = shape.points[k];
      const b = shape.points[(k + 1) % shape.points.length];
      const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
      sx += (len * (a[0] + b[0])) / 2;
      sy += (len * (a[1] + b[1])) / 2;
      total += len;
    });
  });
  if (!(total > 0)) return null;
  const deg = (Math.atan2(sy / total - c.center[1], sx / total - c.center[0]) * 180) / Math.PI;
  return deg < 0 ? deg + 360 : deg;
}
