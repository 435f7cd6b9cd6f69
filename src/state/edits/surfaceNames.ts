// Names the program gives to surfaces. A drawn shape is one surface ("body 2",
// "tube 3"); an enclosure's sides are named by where they are. Generated names
// are unique and never reuse a name in use; names the user typed are never changed.
import type { Point, Shape, SketchFile } from '../sketchFile';
import { edgeNames, signedArea } from '../geometry/polygon';
import { nextNumberedName } from '../../document/rows';

/** What a new shape is, for its name. */
export type ShapeStem = 'body' | 'tube';

export function usedSurfaceNames(doc: SketchFile): Set<string> {
  const used = new Set<string>();
  for (const s of doc.shapes) for (const n of edgeNames(s)) used.add(n);
  return used;
}

/** base, or base (2), base (3)... whichever is not yet taken. */
export function uniqueName(base: string, taken: Set<string>): string {
  if (!taken.has(base)) return base;
  for (let i = 2; ; i++) if (!taken.has(`${base} (${i})`)) return `${base} (${i})`;
}

const numbered = /^(.*) (\d+)$/;

/** "stem N" with N one above the highest N in use, so a name in use is never given again. */
export function nextNumbered(stem: string, taken: Set<string>): string {
  return uniqueName(nextNumberedName(stem, taken), taken);
}

/**
 * A side's place from its inward direction: level sides are floor or roof, upright
 * ones the left or right wall; null for a sloping side. The tolerance is relative
 * to the side's length, so a side drawn level on the grid counts as level.
 */
export function sidePlace(
  a: Point,
  b: Point,
  anticlockwise: boolean,
): 'floor' | 'roof' | 'left wall' | 'right wall' | null {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy);
  if (!(len > 0)) return null;
  // Inside an enclosure is on the left of each side when it runs anticlockwise (y up).
  const sign = anticlockwise ? 1 : -1;
  const nx = (-dy / len) * sign;
  const ny = (dx / len) * sign;
  const tight = 1e-9;
  if (Math.abs(dy) <= tight * len) return ny > 0 ? 'floor' : 'roof';
  if (Math.abs(dx) <= tight * len) return nx > 0 ? 'left wall' : 'right wall';
  return null;
}

/** Names for a new enclosure's sides: by place, numbered when a place repeats; "wall k" (k = side number) otherwise. */
export function enclosureSideNames(points: readonly Point[], taken: Set<string>): string[] {
  const ccw = signedArea(points) > 0;
  const n = points.length;
  const places = points.map((p, k) => sidePlace(p, points[(k + 1) % n], ccw));
  const counts = new Map<string, number>();
  for (const p of places) if (p) counts.set(p, (counts.get(p) ?? 0) + 1);
  const seen = new Map<string, number>();
  const out: string[] = [];
  places.forEach((place, k) => {
    let base: string;
    if (!place) base = `wall ${k + 1}`;
    else if (counts.get(place) === 1) base = place;
    else {
      const i = (seen.get(place) ?? 0) + 1;
      seen.set(place, i);
      base = `${place} ${i}`;
    }
    const name = uniqueName(base, taken);
    taken.add(name);
    out.push(name);
  });
  return out;
}

/** The surface field of a new shape: one name for a body or tube, the sides' names for an enclosure. */
export function newShapeSurface(
  doc: SketchFile,
  kind: Shape['kind'],
  points: readonly Point[],
  stem: ShapeStem = 'body',
): Shape['surface'] {
  const taken = usedSurfaceNames(doc);
  if (kind === 'solid') return nextNumbered(stem, taken);
  return compactSurface(enclosureSideNames(points, taken));
}

/** The name a copy of a surface gets: the next number for generated names ("tube 4"), else "name (2)". */
export function copyName(name: string, taken: Set<string>): string {
  const m = numbered.exec(name);
  return m ? nextNumbered(m[1], taken) : uniqueName(name, taken);
}

/** Store one string when every edge shares the name, else one name per edge. */
export function compactSurface(names: string[]): Shape['surface'] {
  return names.every((n) => n === names[0]) ? names[0] : names;
}
