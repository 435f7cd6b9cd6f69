// Walls and tubes split into parts: surfaces named "<wall> 1", "<wall> 2", ...
// "<wall> n" that follow one another along the edges of one shape or the arcs of
// one circle (profilePieces, the same reading as the app's and the command
// line's flux profile). Their results read as a profile along the wall or
// around the tube. Anything else is not a profile.
import { profilePieces } from '../exchange/profile';
import type { ShapeV1 as Shape } from '../schema';

export interface WallProfile {
  /** The wall's name without the part numbers. */
  wall: string;
  /** Parts in order along the wall: surface index, and the distance of its middle from the wall's start (file units). */
  parts: { surface: number; position: number; length: number }[];
}

const PART = /^(.*\S)\s+(\d+)$/;

/** The split walls of a sketch, in order of their first part's surface index; `names[i]` names surface i. */
export function wallProfiles(shapes: readonly Shape[], names: ReadonlyArray<string>): WallProfile[] {
  const walls = new Map<string, Set<number>>();
  const clean = new Map<string, boolean>();
  for (const name of names) {
    const m = PART.exec(name);
    if (!m) continue;
    const parts = walls.get(m[1]) ?? new Set<number>();
    // "roof 01" and "roof 1" would both be part 1: not a clean numbering.
    if (String(Number(m[2])) !== m[2] || parts.has(Number(m[2]))) clean.set(m[1], false);
    parts.add(Number(m[2]));
    walls.set(m[1], parts);
  }
  const index = new Map(names.map((n, i) => [n, i]));
  const out: WallProfile[] = [];
  for (const [wall, parts] of walls) {
    const n = parts.size;
    // Numbered 1..n with nothing missing, and no surface of the wall's own name besides its parts.
    if (n < 2 || clean.get(wall) === false || index.has(wall)) continue;
    if (![...parts].every((k) => k >= 1 && k <= n)) continue;
    const found = profilePieces(shapes, wall);
    if ('problem' in found || found.pieces.length !== n) continue;
    // Along the wall, or along the arcs of a tube from the start of part 1.
    let along = 0;
    const rows = found.pieces.map((p) => {
      along += p.length;
      return { surface: index.get(p.surface)!, position: along - p.length / 2, length: p.length };
    });
    out.push({ wall, parts: rows });
  }
  return out.sort((a, b) => a.parts[0].surface - b.parts[0].surface);
}
