// The local net flux along a tube split into arcs, or along a wall split into
// parts: one row per piece with its place (the arc's middle angle, degrees
// anticlockwise from +x, as the file runs its arcs; or the distance along the
// wall to the part's middle, file units) and its surface's net flux (W/m^2).
// One builder for the command line and the app.
import { toCsv } from '../csv';
import type { ShapeV1 as Shape } from '../schema';

export interface ProfileRow {
  /** Degrees from +x (arcs) or distance along the wall in file units (parts). */
  at: number;
  /** Length of the piece, file units. */
  length: number;
  surface: string;
  /** Net flux, W/m^2, positive when the surface gives off more than it absorbs. */
  flux: number;
  /** Surface (outer metal) temperature, K. */
  temperature?: number;
  /** Inside of the tube wall, K, where the surface is a tube with a fluid inside. */
  innerTemperature?: number;
}

/** Temperatures of one surface for a profile, K (inner: a tube's inside wall, when it has one). */
export interface ProfileTemperatures {
  temperature: number;
  innerTemperature?: number;
}

export interface Profile {
  /** 'angle' for the arcs of a circle, 'position' for the parts of a wall. */
  along: 'angle' | 'position';
  /** File shape number (from 0). */
  shape: number;
  rows: ProfileRow[];
  /** The largest net flux in size, W/m^2 (with its sign), and where it is. */
  peak: number;
  peakAt: number;
  /** Length-weighted mean net flux, W/m^2. */
  average: number;
  /** peak / average; null when the average is 0 or of the other sign (the ratio would mislead). */
  peakToAverage: number | null;
  /** The hottest piece's temperature (K) and where it is, when temperatures were given: a tube's peak metal temperature. */
  peakTemperature?: number;
  peakTemperatureAt?: number;
}

/**
 * The pieces of a profile: the surface `name` itself, or the parts split from
 * it ("name 1", "name 2"...; on a circle any "name <word>", as "tube 4 a").
 */
export function partOf(surface: string, name: string, circle: boolean): boolean {
  if (surface === name) return true;
  if (!surface.startsWith(`${name} `)) return false;
  const rest = surface.slice(name.length + 1);
  return circle ? /^\S+$/.test(rest) : /^\d+$/.test(rest);
}

const names = (shape: Shape): string[] =>
  typeof shape.surface === 'string'
    ? new Array<string>(shape.circle ? 1 : shape.points.length).fill(shape.surface)
    : shape.surface;

/** One piece of a profile: a surface, its place (degrees from +x, or distance along the wall to its middle) and length. */
export interface ProfilePiece {
  surface: string;
  at: number;
  /** File units. */
  length: number;
}

export interface ProfilePieces {
  along: 'angle' | 'position';
  /** File shape number (from 0). */
  shape: number;
  pieces: ProfilePiece[];
}

/**
 * The pieces of surface `name` (or of its parts) in order around their circle or
 * along their wall, with their places; or why they make no profile. A wall's
 * parts must be one run of consecutive edges of one shape (it may wrap past the
 * closing edge), each part a run of its own; numbered parts running against
 * the edges are read from part 1, so positions start where part 1 does.
 */
export function profilePieces(shapes: readonly Shape[], name: string): ProfilePieces | { problem: string } {
  const holds = (sh: Shape) => names(sh).some((n) => partOf(n, name, !!sh.circle));
  const s = shapes.findIndex(holds);
  if (s < 0) return { problem: `no surface "${name}" (nor parts "${name} 1", "${name} 2"...) in the sketch` };
  if (shapes.some((sh, k) => k !== s && holds(sh)))
    return { problem: `the parts of "${name}" lie on more than one shape: a profile runs along one wall or one tube` };
  const shape = shapes[s];
  const all = names(shape);
  let pieces: ProfilePiece[] = [];
  if (shape.circle) {
    const step = 360 / all.length;
    const length = (2 * Math.PI * shape.circle.radius) / all.length;
    all.forEach((n, k) => {
      if (partOf(n, name, true)) pieces.push({ surface: n, at: (k + 0.5) * step, length });
    });
  } else {
    const m = all.length;
    const on = all.map((n) => partOf(n, name, false));
    const starts = on.flatMap((v, k) => (v && !on[(k + m - 1) % m] ? [k] : []));
    if (starts.length > 1) return { problem: `the parts of "${name}" are not one run of consecutive edges` };
    // Every edge on (a closed outline all of one wall): start where one part meets the next.
    const first =
      starts[0] ??
      Math.max(
        0,
        all.findIndex((n, k) => n !== all[(k + m - 1) % m]),
      );
    for (let step = 0; step < m && on[(first + step) % m]; step++) {
      const k = (first + step) % m;
      const a = shape.points[k];
      const b = shape.points[(k + 1) % m];
      const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
      const last = pieces[pieces.length - 1];
      if (last?.surface === all[k]) last.length += length;
      else pieces.push({ surface: all[k], at: 0, length });
    }
    if (new Set(pieces.map((p) => p.surface)).size !== pieces.length)
      return { problem: `a part of "${name}" is not one run of consecutive edges` };
    // Numbered parts must run in order along the edges, one way or the other; read them from part 1.
    const numbers = pieces.map((p) => (p.surface === name ? NaN : Number(p.surface.slice(name.length + 1))));
    const rising = numbers.every((v, k) => k === 0 || v > numbers[k - 1]);
    const falling = numbers.every((v, k) => k === 0 || v < numbers[k - 1]);
    if (pieces.length > 1 && !rising && !falling && numbers.every((v) => !Number.isNaN(v)))
      return { problem: `the parts of "${name}" are not numbered in order along the wall` };
    if (pieces.length > 1 && falling) pieces = pieces.reverse();
    let along = 0;
    for (const p of pieces) {
      p.at = along + p.length / 2;
      along += p.length;
    }
  }
  return { along: shape.circle ? 'angle' : 'position', shape: s, pieces };
}

/**
 * The profile of surface `name` (or of its parts) on the shape that has it;
 * `flux` gives each surface's net flux in W/m^2. A message when no shape has
 * it, when its pieces are fewer than two surfaces or do not follow one another,
 * or when a piece has no flux.
 */
export function surfaceProfile(
  shapes: readonly Shape[],
  name: string,
  flux: (surface: string) => number | undefined,
  temperatures?: (surface: string) => ProfileTemperatures | undefined,
): Profile | { problem: string } {
  const found = profilePieces(shapes, name);
  if ('problem' in found) return found;
  const rows: ProfileRow[] = found.pieces.map((p) => ({ ...p, flux: NaN }));
  // One surface over several edges has one flux: no profile to show.
  if (new Set(rows.map((r) => r.surface)).size < 2)
    return {
      problem: `"${name}" is one piece; split it into parts (a tube into arcs) to see how the flux varies along it`,
    };
  for (const r of rows) {
    const q = flux(r.surface);
    if (q === undefined || !Number.isFinite(q)) return { problem: `no net flux for surface "${r.surface}"` };
    r.flux = q;
    const t = temperatures?.(r.surface);
    if (t && Number.isFinite(t.temperature)) {
      r.temperature = t.temperature;
      if (t.innerTemperature !== undefined && Number.isFinite(t.innerTemperature))
        r.innerTemperature = t.innerTemperature;
    }
  }
  const hottest = rows.every((r) => r.temperature !== undefined)
    ? rows.reduce((a, b) => ((b.temperature ?? 0) > (a.temperature ?? 0) ? b : a))
    : undefined;
  let peak = rows[0];
  let total = 0;
  let weighted = 0;
  for (const r of rows) {
    if (Math.abs(r.flux) > Math.abs(peak.flux)) peak = r;
    total += r.length;
    weighted += r.length * r.flux;
  }
  const average = weighted / total;
  const ratio = average !== 0 && Math.sign(average) === Math.sign(peak.flux) ? peak.flux / average : null;
  return {
    along: found.along,
    shape: found.shape,
    rows,
    peak: peak.flux,
    peakAt: peak.at,
    average,
    peakToAverage: ratio,
    ...(hottest ? { peakTemperature: hottest.temperature, peakTemperatureAt: hottest.at } : {}),
  };
}

/**
 * The profile as CSV: angle (degrees from +x, anticlockwise) or position (file
 * units) against net flux (W/m^2), and the temperatures (K) when every piece has them.
 */
export function profileCsv(p: Profile, units: string): string {
  const head = p.along === 'angle' ? 'angle from +x anticlockwise (deg)' : `position along the wall (${units})`;
  const withT = p.rows.every((r) => r.temperature !== undefined);
  const withInner = withT && p.rows.every((r) => r.innerTemperature !== undefined);
  return toCsv([
    [
      head,
      'surface',
      `length (${units})`,
      'net flux (W/m^2)',
      ...(withT ? ['temperature (K)'] : []),
      ...(withInner ? ['inner wall temperature (K)'] : []),
    ],
    ...p.rows.map((r) => [
      Number(r.at.toPrecision(12)),
      r.surface,
      Number(r.length.toPrecision(12)),
      r.flux,
      ...(withT ? [r.temperature ?? ''] : []),
      ...(withInner ? [r.innerTemperature ?? ''] : []),
    ]),
  ]);
}
