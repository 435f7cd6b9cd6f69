// The key of the view-factor stage: the polygons' kinds and coordinates, and
// nothing else (no names, no properties, no units). View factors are
// dimensionless and do not change under a uniform change of scale, so a
// geometry that is another one scaled about the origin (a change of units by
// 'convert') keys to the same factors.
import type { CircleInput, PolygonInput } from '../../core/scene';

export interface GeometryKey {
  /** 1 for an enclosure, 0 for a solid, per polygon. */
  enclosure: Uint8Array;
  /** Points per polygon. */
  pointCount: Int32Array;
  /** All coordinates, polygon after polygon, sketch units. */
  coords: Float64Array;
}

export function geometryKey(polygons: readonly PolygonInput[], circles: readonly CircleInput[] = []): GeometryKey {
  // A circle enters as -arcs "points" and its centre and radius (all scale alike).
  const enclosure = Uint8Array.from([...polygons, ...circles], (p) => (p.kind === 'enclosure' ? 1 : 0));
  const pointCount = Int32Array.from([...polygons.map((p) => p.points.length >> 1), ...circles.map((c) => -c.arcs)]);
  let total = 3 * circles.length;
  for (const p of polygons) total += p.points.length;
  const coords = new Float64Array(total);
  let at = 0;
  for (const p of polygons) {
    for (let k = 0; k < p.points.length; k++) coords[at++] = p.points[k];
  }
  for (const c of circles) {
    coords[at++] = c.cx;
    coords[at++] = c.cy;
    coords[at++] = c.radius;
  }
  return { enclosure, pointCount, coords };
}

/**
 * A unit conversion rounds each scaled coordinate to 15 significant digits
 * (src/state/edits/unitEdits.ts), a relative change of at most 5e-15; this
 * bound leaves room for that and for the scale's own rounding while staying
 * far below any change a view factor could show (the file keeps edges at least
 * 2^-40 of their coordinates).
 */
const SCALE_TOLERANCE = 1e-13;

/**
 * The factor s with b = s * a (every coordinate, same polygons and kinds), or
 * null when b is not a scaled copy of a. Returns exactly 1 for identical keys.
 */
export function scaleBetween(a: GeometryKey, b: GeometryKey): number | null {
  if (a === b) return 1;
  const n = a.coords.length;
  if (n !== b.coords.length || a.pointCount.length !== b.pointCount.length) return null;
  for (let p = 0; p < a.pointCount.length; p++) {
    if (a.pointCount[p] !== b.pointCount[p] || a.enclosure[p] !== b.enclosure[p]) return null;
  }
  let identical = true;
  let big = 0;
  for (let k = 0; k < n; k++) {
    if (a.coords[k] !== b.coords[k]) identical = false;
    if (Math.abs(a.coords[k]) > Math.abs(a.coords[big])) big = k;
  }
  if (identical) return 1;
  if (a.coords[big] === 0) return null;
  const s = b.coords[big] / a.coords[big];
  if (!(s > 0 && Number.isFinite(s))) return null;
  for (let k = 0; k < n; k++) {
    const want = b.coords[k];
    if (Math.abs(want - s * a.coords[k]) > SCALE_TOLERANCE * Math.abs(want)) return null;
  }
  return s;
}
