// Walls split into parts: surfaces named "<wall> 1", "<wall> 2", ... "<wall> n"
// that follow one another along the edges of one shape (each part a run of
// consecutive edges, part k + 1 starting where part k ends, in either
// direction). Their results read as a profile along the wall. Anything else
// (parts on different shapes, gaps, numbers missing) is not a profile.

export interface ProfileShape {
  /** Surface name of each edge, in edge order. */
  surface: ReadonlyArray<string>;
}

export interface WallProfile {
  /** The wall's name without the part numbers. */
  wall: string;
  /** Parts in order along the wall: surface index, and the distance of its middle from the wall's start (file units). */
  parts: { surface: number; position: number; length: number }[];
}

const PART = /^(.*\S)\s+(\d+)$/;

interface Run {
  shape: number;
  start: number;
  end: number;
}

/** The one run of consecutive edges (cyclic) a surface covers in one shape, or null. */
function runOf(shapes: ReadonlyArray<ProfileShape>, name: string): Run | null {
  let found: Run | null = null;
  for (let s = 0; s < shapes.length; s++) {
    const edges = shapes[s].surface;
    const m = edges.length;
    const on = edges.map((n) => n === name);
    const count = on.filter(Boolean).length;
    if (count === 0) continue;
    if (found || count === m) return null;
    const starts = on.map((v, k) => v && !on[(k + m - 1) % m]).filter(Boolean).length;
    if (starts !== 1) return null;
    const start = on.findIndex((v, k) => v && !on[(k + m - 1) % m]);
    found = { shape: s, start, end: (start + count - 1) % m };
  }
  return found;
}

/**
 * The split walls of a sketch, in order of their first part's surface index.
 * `names[i]` and `lengths[i]` (file units) describe surface i.
 */
export function wallProfiles(
  shapes: ReadonlyArray<ProfileShape>,
  names: ReadonlyArray<string>,
  lengths: ArrayLike<number>,
): WallProfile[] {
  const walls = new Map<string, Map<number, number>>();
  names.forEach((name, i) => {
    const m = PART.exec(name);
    if (!m) return;
    const parts = walls.get(m[1]) ?? new Map<number, number>();
    // "roof 01" and "roof 1" would both be part 1: not a clean numbering.
    if (String(Number(m[2])) !== m[2] || parts.has(Number(m[2]))) parts.set(-1, i);
    else parts.set(Number(m[2]), i);
    walls.set(m[1], parts);
  });
  const out: WallProfile[] = [];
  for (const [wall, parts] of walls) {
    const n = parts.size;
    if (n < 2 || parts.has(-1)) continue;
    const order: number[] = [];
    for (let k = 1; k <= n; k++) {
      const i = parts.get(k);
      if (i === undefined) break;
      order.push(i);
    }
    if (order.length !== n) continue;
    const runs = order.map((i) => runOf(shapes, names[i]));
    if (runs.some((r) => r === null || r.shape !== runs[0]!.shape)) continue;
    const m = shapes[runs[0]!.shape].surface.length;
    const follows = (a: Run, b: Run) => b.start === (a.end + 1) % m;
    const forward = runs.every((r, k) => k === 0 || follows(runs[k - 1]!, r!));
    const backward = runs.every((r, k) => k === 0 || follows(r!, runs[k - 1]!));
    if (!forward && !backward) continue;
    let along = 0;
    const profile: WallProfile = { wall, parts: [] };
    for (const i of order) {
      const L = lengths[i];
      profile.parts.push({ surface: i, position: along + L / 2, length: L });
      along += L;
    }
    out.push(profile);
  }
  return out.sort((a, b) => a.parts[0].surface - b.parts[0].surface);
}
