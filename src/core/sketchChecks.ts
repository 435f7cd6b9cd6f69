// Geometric validity of a sketch, checked before the view-factor core runs
// (the core assumes valid geometry). Every test that decides "touching or not"
// uses exact orientation predicates, so collinear and touching cases are
// decided exactly, not by a tolerance. Indices in findings count from 0; the
// document layer turns them into messages for people.
import Flatbush from 'flatbush';
import { orient as orientation } from './orient';
import { pointInPolygon } from './pointInPolygon';
import type { PolygonInput } from './scene';

/** A location in sketch units. */
export type Point = [number, number];

interface EdgeContact {
  shape: number;
  /** Edge k runs from point k to point k+1 (the last edge closes the polygon). */
  edge: number;
  otherShape: number;
  otherEdge: number;
  /** Where the two edges meet (for an overlap: one end of the shared stretch). */
  at: Point;
}

/** One broken rule, with the shape/edge indices (from 0) and a location in sketch units. */
export type GeometryFinding =
  | { rule: 'too-few-points'; shape: number; pointCount: number }
  | { rule: 'zero-area'; shape: number }
  /** Point `point` repeats the one before it (a zero-length edge); the document layer repairs these first. */
  | { rule: 'repeated-point'; shape: number; point: number; at: Point }
  /** Two edges cross each other at a single interior point of both. */
  | ({ rule: 'edges-cross' } & EdgeContact)
  /** Two edges meet at a single point (a vertex on the other edge, or shared vertices). */
  | ({ rule: 'edges-touch' } & EdgeContact)
  /** Two collinear edges share a stretch from `at` to `to`. */
  | ({ rule: 'edges-overlap' } & EdgeContact & { to: Point })
  | { rule: 'several-enclosures'; shapes: number[] }
  /** A solid (point `point`, at `at`) lies outside the enclosure, or surrounds it. */
  | { rule: 'outside-enclosure'; shape: number; enclosure: number; point: number; at: Point }
  /** A solid lies wholly inside another solid. */
  | { rule: 'inside-solid'; shape: number; otherShape: number; point: number; at: Point };

export interface GeometryCheckOptions {
  /** Stop collecting edge contacts after this many (a badly broken sketch would list thousands). Default 50. */
  maxFindings?: number;
}

/**
 * Check a sketch's polygons (points flat x0,y0,x1,y1,..., in any winding, no
 * repeated consecutive points) against the rules the view-factor core assumes:
 * each polygon has at least 3 points and non-zero area and does not cross or
 * touch itself; at most one enclosure; every solid lies strictly inside the
 * enclosure (if there is one) and solids neither cross, touch nor contain
 * each other. Returns the broken rules; an empty list means the sketch is valid.
 * Cost: about (edges) log (edges) for ordinary sketches (a spatial index picks
 * the edge pairs whose bounding boxes meet).
 */
export function checkSketchGeometry(
  polygons: readonly PolygonInput[],
  options: GeometryCheckOptions = {},
): GeometryFinding[] {
  const maxFindings = options.maxFindings ?? 50;
  const findings: GeometryFinding[] = [];
  const usable: boolean[] = polygons.map((polygon, shape) => {
    const count = Math.floor(polygon.points.length / 2);
    if (count < 3) {
      findings.push({ rule: 'too-few-points', shape, pointCount: count });
      return false;
    }
    const repeated = firstRepeatedPoint(polygon.points);
    if (repeated >= 0) {
      findings.push({
        rule: 'repeated-point',
        shape,
        point: repeated,
        at: [polygon.points[2 * repeated], polygon.points[2 * repeated + 1]],
      });
      return false;
    }
    if (isCollinear(polygon.points)) {
      findings.push({ rule: 'zero-area', shape });
      return false;
    }
    return true;
  });

  const enclosures = polygons.flatMap((p, i) => (p.kind === 'enclosure' ? [i] : []));
  if (enclosures.length > 1) findings.push({ rule: 'several-enclosures', shapes: enclosures });

  const contacts = findEdgeContacts(polygons, usable, maxFindings);
  findings.push(...contacts.findings);

  // Containment is decided by one vertex, which is valid only when the two
  // boundaries do not meet at all; pairs in contact are already reported.
  if (enclosures.length === 1 && usable[enclosures[0]]) {
    const enclosure = enclosures[0];
    const ring = polygons[enclosure].points;
    polygons.forEach((polygon, shape) => {
      if (shape === enclosure || !usable[shape] || contacts.touching.has(pairKey(shape, enclosure))) return;
      const x = polygon.points[0];
      const y = polygon.points[1];
      if (!pointInPolygon(x, y, ring))
        findings.push({ rule: 'outside-enclosure', shape, enclosure, point: 0, at: [x, y] });
    });
  }
  findings.push(...findNestedSolids(polygons, usable, contacts.touching));
  return findings;
}

/** Index of the first point equal to its predecessor (point 0 compares with the last), or -1. */
function firstRepeatedPoint(points: ArrayLike<number>): number {
  const n = Math.floor(points.length / 2);
  for (let k = 0, j = n - 1; k < n; j = k++) {
    if (points[2 * k] === points[2 * j] && points[2 * k + 1] === points[2 * j + 1]) return k;
  }
  return -1;
}

/** All points on one line (called after repeated points are excluded, so points 0 and 1 differ). */
function isCollinear(points: ArrayLike<number>): boolean {
  const n = Math.floor(points.length / 2);
  const ax = points[0],
    ay = points[1];
  const bx = points[2],
    by = points[3];
  for (let m = 2; m < n; m++) {
    if (orientation(ax, ay, bx, by, points[2 * m], points[2 * m + 1]) !== 0) return false;
  }
  return true;
}

function pairKey(a: number, b: number): string {
  return a < b ? `${a}:${b}` : `${b}:${a}`;
}

interface Edges {
  shape: Int32Array;
  index: Int32Array;
  /** Edge ends, 4 numbers per edge: x0, y0, x1, y1. */
  ends: Float64Array;
  /** Points in each edge's polygon, to recognise neighbours across the closing edge. */
  ringSize: Int32Array;
}

function collectEdges(polygons: readonly PolygonInput[], usable: boolean[]): Edges {
  let total = 0;
  polygons.forEach((p, i) => {
    if (usable[i]) total += Math.floor(p.points.length / 2);
  });
  const edges: Edges = {
    shape: new Int32Array(total),
    index: new Int32Array(total),
    ends: new Float64Array(4 * total),
    ringSize: new Int32Array(total),
  };
  let e = 0;
  polygons.forEach((polygon, shape) => {
    if (!usable[shape]) return;
    const pts = polygon.points;
    const n = Math.floor(pts.length / 2);
    for (let k = 0; k < n; k++, e++) {
      const next = (k + 1) % n;
      edges.shape[e] = shape;
      edges.index[e] = k;
      edges.ringSize[e] = n;
      edges.ends[4 * e] = pts[2 * k];
      edges.ends[4 * e + 1] = pts[2 * k + 1];
      edges.ends[4 * e + 2] = pts[2 * next];
      edges.ends[4 * e + 3] = pts[2 * next + 1];
    }
  });
  return edges;
}

function findEdgeContacts(polygons: readonly PolygonInput[], usable: boolean[], maxFindings: number) {
  const findings: GeometryFinding[] = [];
  const touching = new Set<string>();
  const edges = collectEdges(polygons, usable);
  const count = edges.shape.length;
  if (count === 0) return { findings, touching };
  const e = edges.ends;
  const index = new Flatbush(count);
  for (let i = 0; i < count; i++) {
    index.add(
      Math.min(e[4 * i], e[4 * i + 2]),
      Math.min(e[4 * i + 1], e[4 * i + 3]),
      Math.max(e[4 * i], e[4 * i + 2]),
      Math.max(e[4 * i + 1], e[4 * i + 3]),
    );
  }
  index.finish();
  for (let i = 0; i < count && findings.length < maxFindings; i++) {
    const minX = Math.min(e[4 * i], e[4 * i + 2]),
      maxX = Math.max(e[4 * i], e[4 * i + 2]);
    const minY = Math.min(e[4 * i + 1], e[4 * i + 3]),
      maxY = Math.max(e[4 * i + 1], e[4 * i + 3]);
    const candidates = index.search(minX, minY, maxX, maxY, (j) => j > i);
    candidates.sort((a, b) => a - b); // stable, readable order of reports
    for (const j of candidates) {
      const contact = contactOf(edges, i, j);
      if (!contact) continue;
      findings.push(contact);
      touching.add(pairKey(edges.shape[i], edges.shape[j]));
      if (findings.length >= maxFindings) break;
    }
  }
  return { findings: withoutEchoes(findings), touching };
}

/**
 * A solid resting along the wall also touches it with the two edges beside
 * the shared stretch, and a corner on a wall touches it with two edges: one
 * report per place is enough. Drops touches at a place already reported for
 * the same pair of shapes.
 */
function withoutEchoes(findings: GeometryFinding[]): GeometryFinding[] {
  const overlaps = findings.filter((f) => f.rule === 'edges-overlap');
  const seen = new Set<string>();
  return findings.filter((f) => {
    if (f.rule !== 'edges-touch') return true;
    const [x, y] = f.at;
    const pair = pairKey(f.shape, f.otherShape);
    const place = `${pair}@${x},${y}`;
    if (seen.has(place)) return false;
    seen.add(place);
    return !overlaps.some(
      (o) =>
        pairKey(o.shape, o.otherShape) === pair &&
        orientation(o.at[0], o.at[1], o.to[0], o.to[1], x, y) === 0 &&
        within(o.at[0], o.at[1], o.to[0], o.to[1], x, y),
    );
  });
}

/** How edges i and j (i < j) meet, or null when they do not (or only as neighbours should). */
function contactOf(edges: Edges, i: number, j: number): GeometryFinding | null {
  const e = edges.ends;
  const ax = e[4 * i],
    ay = e[4 * i + 1],
    bx = e[4 * i + 2],
    by = e[4 * i + 3];
  const cx = e[4 * j],
    cy = e[4 * j + 1],
    dx = e[4 * j + 2],
    dy = e[4 * j + 3];
  const base = { shape: edges.shape[i], edge: edges.index[i], otherShape: edges.shape[j], otherEdge: edges.index[j] };

  if (edges.shape[i] === edges.shape[j]) {
    const n = edges.ringSize[i];
    const ki = edges.index[i],
      kj = edges.index[j];
    // Neighbours share a vertex by construction; they break a rule only by folding back onto each other.
    if (kj === ki + 1) return foldBack(ax, ay, bx, by, dx, dy, base);
    if (ki === 0 && kj === n - 1) return foldBack(cx, cy, dx, dy, bx, by, base);
  }

  const s1 = Math.sign(orientation(cx, cy, dx, dy, ax, ay));
  const s2 = Math.sign(orientation(cx, cy, dx, dy, bx, by));
  const s3 = Math.sign(orientation(ax, ay, bx, by, cx, cy));
  const s4 = Math.sign(orientation(ax, ay, bx, by, dx, dy));
  if (s1 * s2 > 0 || s3 * s4 > 0) return null;
  if (s1 === 0 && s2 === 0) return collinearContact(ax, ay, bx, by, cx, cy, dx, dy, base);
  if (s1 * s2 < 0 && s3 * s4 < 0) {
    // Proper crossing; the location is for the message only, so floating point is fine.
    const rx = bx - ax,
      ry = by - ay,
      sx = dx - cx,
      sy = dy - cy;
    const t = ((cx - ax) * sy - (cy - ay) * sx) / (rx * sy - ry * sx);
    return { rule: 'edges-cross', ...base, at: [ax + t * rx, ay + t * ry] };
  }
  // One end lies exactly on the other segment's line; it touches if it is within the segment.
  if (s3 === 0 && within(ax, ay, bx, by, cx, cy)) return { rule: 'edges-touch', ...base, at: [cx, cy] };
  if (s4 === 0 && within(ax, ay, bx, by, dx, dy)) return { rule: 'edges-touch', ...base, at: [dx, dy] };
  if (s1 === 0 && within(cx, cy, dx, dy, ax, ay)) return { rule: 'edges-touch', ...base, at: [ax, ay] };
  if (s2 === 0 && within(cx, cy, dx, dy, bx, by)) return { rule: 'edges-touch', ...base, at: [bx, by] };
  return null;
}

/** Neighbour edges p -> q -> r: a rule is broken only when r turns straight back along q -> p. */
function foldBack(
  px: number,
  py: number,
  qx: number,
  qy: number,
  rx: number,
  ry: number,
  base: Omit<EdgeContact, 'at'>,
): GeometryFinding | null {
  if (orientation(px, py, qx, qy, rx, ry) !== 0) return null;
  // Collinear vectors: each product term has the sign of the dot product, so no cancellation.
  if ((qx - px) * (rx - qx) + (qy - py) * (ry - qy) > 0) return null;
  const backToP = Math.hypot(px - qx, py - qy) <= Math.hypot(rx - qx, ry - qy);
  return { rule: 'edges-overlap', ...base, at: [qx, qy], to: backToP ? [px, py] : [rx, ry] };
}

/** For c collinear with a-b: is c within the segment's bounding box (hence on the segment)? */
function within(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): boolean {
  return Math.min(ax, bx) <= cx && cx <= Math.max(ax, bx) && Math.min(ay, by) <= cy && cy <= Math.max(ay, by);
}

function collinearContact(
  ax: number,
  ay: number,
  bx: number,
  by: number,
  cx: number,
  cy: number,
  dx: number,
  dy: number,
  base: Omit<EdgeContact, 'at'>,
): GeometryFinding | null {
  // Project on the axis along which a-b is longer (never zero: edges have length).
  const alongX = Math.abs(bx - ax) >= Math.abs(by - ay);
  const pts: Point[] = [
    [ax, ay],
    [bx, by],
    [cx, cy],
    [dx, dy],
  ];
  const u = (p: Point) => (alongX ? p[0] : p[1]);
  const lo = Math.max(Math.min(u(pts[0]), u(pts[1])), Math.min(u(pts[2]), u(pts[3])));
  const hi = Math.min(Math.max(u(pts[0]), u(pts[1])), Math.max(u(pts[2]), u(pts[3])));
  if (lo > hi) return null;
  const start = pts.find((p) => u(p) === lo)!;
  if (lo === hi) return { rule: 'edges-touch', ...base, at: start };
  const end = pts.find((p) => u(p) === hi)!;
  return { rule: 'edges-overlap', ...base, at: start, to: end };
}

/** Solids wholly inside other solids (pairs whose bounding boxes nest and whose boundaries do not meet). */
function findNestedSolids(
  polygons: readonly PolygonInput[],
  usable: boolean[],
  touching: Set<string>,
): GeometryFinding[] {
  const solids = polygons.flatMap((p, i) => (p.kind === 'solid' && usable[i] ? [i] : []));
  if (solids.length < 2) return [];
  const boxes = solids.map((i) => boundingBox(polygons[i].points));
  const index = new Flatbush(solids.length);
  for (const b of boxes) index.add(b[0], b[1], b[2], b[3]);
  index.finish();
  const findings: Extract<GeometryFinding, { rule: 'inside-solid' }>[] = [];
  boxes.forEach((box, a) => {
    for (const b of index.search(box[0], box[1], box[2], box[3], (j) => j !== a)) {
      const inner = solids[a],
        outer = solids[b];
      const ob = boxes[b];
      const nests = ob[0] <= box[0] && ob[1] <= box[1] && box[2] <= ob[2] && box[3] <= ob[3];
      if (!nests || touching.has(pairKey(inner, outer))) continue;
      const pts = polygons[inner].points;
      if (pointInPolygon(pts[0], pts[1], polygons[outer].points)) {
        findings.push({ rule: 'inside-solid', shape: inner, otherShape: outer, point: 0, at: [pts[0], pts[1]] });
      }
    }
  });
  return findings.sort((p, q) => p.shape - q.shape);
}

function boundingBox(points: ArrayLike<number>): [number, number, number, number] {
  let minX = Infinity,
    minY = Infinity,
    maxX = -Infinity,
    maxY = -Infinity;
  for (let k = 0; k + 1 < points.length; k += 2) {
    minX = Math.min(minX, points[k]);
    maxX = Math.max(maxX, points[k]);
    minY = Math.min(minY, points[k + 1]);
    maxY = Math.max(maxY, points[k + 1]);
  }
  return [minX, minY, maxX, maxY];
}
