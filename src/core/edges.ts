import { buildArcs, circlesLowerLeft, type ArcSet } from './arc/arcs';
import type { CircleInput, PolygonInput } from './scene';

/**
 * The edges of a sketch, oriented so that the radiating side is on the LEFT of a -> b
 * (left normal n = (-dy, dx) / L points into the space the edge radiates to).
 * An enclosure is walked anticlockwise (inside on the left), a solid clockwise
 * (outside on the left), whatever winding the input used.
 * Edge ids keep the input numbering: polygon by polygon, edge k from point k to k+1.
 * Coordinates are in sketch units relative to `originX, originY` (the lower-left corner
 * of the sketch's bounding box): a sketch drawn far from the origin, say at 1e6 with
 * millimetre features, then computes with small, exactly shifted numbers.
 */
export interface EdgeSet {
  count: number;
  ax: Float64Array;
  ay: Float64Array;
  bx: Float64Array;
  by: Float64Array;
  length: Float64Array;
  /** Polygon index of each edge. */
  polygon: Int32Array;
  /** The oriented edge that ends where this one starts (shares point a). */
  prevEdge: Int32Array;
  /** The oriented edge that starts where this one ends (shares point b). */
  nextEdge: Int32Array;
  hasEnclosure: boolean;
  /** Edges of polygon p are polygonStart[p] .. polygonStart[p+1]-1. */
  polygonStart: Int32Array;
  /** 1 for an enclosure, 0 for a solid, per polygon. */
  polygonIsEnclosure: Uint8Array;
  originX: number;
  originY: number;
  /** The exact circles' arcs; arc a is edge count + a in edge matrices. */
  arcs: ArcSet;
}

/** Edges a scene's shapes make, before they are built: polygon edges (one per point) plus arcs. */
export function sceneEdgeCount(polygons: readonly PolygonInput[], circles: readonly CircleInput[] = []): number {
  let n = 0;
  for (const p of polygons) n += p.points.length >> 1;
  for (const c of circles) n += c.arcs;
  return n;
}

/** Straight edges plus arcs: the size of an edge matrix's side. */
export function totalEdgeCount(edges: EdgeSet): number {
  return edges.count + edges.arcs.count;
}

/** Lengths of every edge, straight ones then arcs (sketch units). */
export function allEdgeLengths(edges: EdgeSet): Float64Array {
  const out = new Float64Array(totalEdgeCount(edges));
  out.set(edges.length);
  out.set(edges.arcs.length, edges.count);
  return out;
}

/**
 * Largest coordinate magnitude of the edges' start points (sketch units, shifted
 * origin). It scales the float margins of every pair's view region, so two sketches
 * share a pair's number only when they share this extent.
 */
export function sketchExtent(e: EdgeSet): number {
  let extent = 0;
  for (let k = 0; k < e.count; k++) extent = Math.max(extent, Math.abs(e.ax[k]), Math.abs(e.ay[k]));
  return extent;
}

/**
 * Largest coordinate magnitude of the edges' start points and of the circles to their
 * rims (sketch units, shifted origin). It scales the exact circles' float margins
 * (arc/discShadow.ts), so two sketches share a pair's number only when they share it too.
 */
export function extentWithCircles(e: EdgeSet): number {
  let extent = sketchExtent(e);
  const A = e.arcs;
  for (let c = 0; c < A.circleCount; c++)
    extent = Math.max(extent, Math.abs(A.cx[c]) + A.r[c], Math.abs(A.cy[c]) + A.r[c]);
  return extent;
}

/** Twice the signed area of a flat [x0,y0,x1,y1,...] polygon; > 0 when anticlockwise (y up). */
export function signedArea2(points: ArrayLike<number>): number {
  const n = points.length >> 1;
  if (n < 3) return 0;
  // Relative to the first point: a small polygon far from the origin (0.1 m at 1e9 m)
  // would otherwise lose its area in the rounding of products near 1e18.
  const x0 = points[0];
  const y0 = points[1];
  let s = 0;
  for (let k = 1; k + 1 < n; k++) {
    const ax = points[2 * k] - x0;
    const ay = points[2 * k + 1] - y0;
    const bx = points[2 * k + 2] - x0;
    const by = points[2 * k + 3] - y0;
    s += ax * by - bx * ay;
  }
  return s;
}

/** Build the oriented edge set of a sketch. Throws on a polygon with fewer than 3 points. */
export function buildEdges(polygons: readonly PolygonInput[], circles: readonly CircleInput[] = []): EdgeSet {
  let count = 0;
  for (const poly of polygons) {
    const n = poly.points.length >> 1;
    if (n < 3 || poly.points.length % 2 !== 0) throw new Error('a polygon needs at least 3 points given as x,y pairs');
    count += n;
  }
  const ax = new Float64Array(count);
  const ay = new Float64Array(count);
  const bx = new Float64Array(count);
  const by = new Float64Array(count);
  const length = new Float64Array(count);
  const polygon = new Int32Array(count);
  const prevEdge = new Int32Array(count);
  const nextEdge = new Int32Array(count);
  let hasEnclosure = circles.some((c) => c.kind === 'enclosure');
  let originX = Infinity,
    originY = Infinity;
  for (const poly of polygons) {
    for (let k = 0; k < poly.points.length; k += 2) {
      originX = Math.min(originX, poly.points[k]);
      originY = Math.min(originY, poly.points[k + 1]);
    }
  }
  [originX, originY] = circlesLowerLeft(circles, originX, originY);
  if (count === 0 && circles.length === 0) originX = originY = 0;
  const polygonStart = new Int32Array(polygons.length + 1);
  const polygonIsEnclosure = new Uint8Array(polygons.length);
  let base = 0;
  polygons.forEach((poly, p) => {
    polygonStart[p] = base;
    polygonIsEnclosure[p] = poly.kind === 'enclosure' ? 1 : 0;
    const pts = poly.points;
    const n = pts.length >> 1;
    if (poly.kind === 'enclosure') hasEnclosure = true;
    const ccw = signedArea2(pts) > 0;
    // Enclosures radiate inward: keep anticlockwise order. Solids radiate outward: clockwise.
    const flip = poly.kind === 'enclosure' ? !ccw : ccw;
    for (let k = 0; k < n; k++) {
      const m = k + 1 === n ? 0 : k + 1;
      const e = base + k;
      const [s, t] = flip ? [m, k] : [k, m];
      ax[e] = pts[2 * s] - originX;
      ay[e] = pts[2 * s + 1] - originY;
      bx[e] = pts[2 * t] - originX;
      by[e] = pts[2 * t + 1] - originY;
      length[e] = Math.hypot(bx[e] - ax[e], by[e] - ay[e]);
      polygon[e] = p;
      const before = base + (k === 0 ? n - 1 : k - 1);
      const after = base + m;
      // Without a flip edge k+1 follows edge k; with a flip the walk runs backwards.
      nextEdge[e] = flip ? before : after;
      prevEdge[e] = flip ? after : before;
    }
    base += n;
  });
  polygonStart[polygons.length] = base;
  return {
    count,
    ax,
    ay,
    bx,
    by,
    length,
    polygon,
    prevEdge,
    nextEdge,
    hasEnclosure,
    polygonStart,
    polygonIsEnclosure,
    originX,
    originY,
    arcs: buildArcs(circles, originX, originY),
  };
}
