import type { ObstacleIndex } from '../obstacles';
import { closestFraction as closestFractionIn } from '../segmentPoint';
import type { ViewRegion } from './viewRegion';

// Module-local copy of a hot import (see integrator.ts).
const closestFraction = closestFractionIn;

// Does a body cut a pair's view region H from one side string to the other, shown by
// the corners of the convex polygon that stands in for it (ObstacleIndex.bodyHullXY:
// a convex body's own corners, or a star's clean hull)? For long, thin bodies whose
// inner disc (BodyClipper.cutsView) falls short of the strings. Float tests with
// margins that only ever say no in doubt. Sketch units.

/**
 * Bodies whose blocking disc reaches past this fraction of their bounding circle are
 * left to the disc test: the corner test would cost more than the few pairs it adds
 * (a 75-sided tube row ran 3-9% slower with it; squashed and star bodies gain).
 */
const ROUND_BODY = 0.9;

/** Per body, 1 when the corner test is worth trying: a stand-in polygon, and a blocking disc short of the bounding circle. */
export function cornerTestFlags(ob: ObstacleIndex): Uint8Array {
  const flags = new Uint8Array(ob.bodyCount);
  for (let b = 0; b < ob.bodyCount; b++)
    flags[b] = ob.bodyHullStart[b] < ob.bodyHullStart[b + 1] && ob.bodyRHull[b] <= ROUND_BODY * ob.bodyR[b] ? 1 : 0;
  return flags;
}

/**
 * Does body b's stand-in polygon surely cross both side strings of H (sides 1 and 3,
 * both of length)? Its bounding circle must reach both first (two distances, no
 * corner read).
 */
export function crossesBothStrings(ob: ObstacleIndex, R: ViewRegion, b: number): boolean {
  if (!circleMeetsSide(ob, R, 1, b) || !circleMeetsSide(ob, R, 3, b)) return false;
  return crossesSide(ob, R, 1, b) && crossesSide(ob, R, 3, b);
}

/** Does body b's bounding circle meet side k of H (float test, yes in doubt)? */
function circleMeetsSide(ob: ObstacleIndex, R: ViewRegion, k: number, b: number): boolean {
  const r = ob.bodyR[b] * (1 + 1e-9);
  return centreToSideSquared(ob, R, k, b) <= r * r;
}

/** Squared distance from body b's centre to side k of H (the segment), sketch units squared. */
export function centreToSideSquared(ob: ObstacleIndex, R: ViewRegion, k: number, b: number): number {
  const cx = ob.bodyCx[b],
    cy = ob.bodyCy[b];
  const x0 = R.sx[k],
    y0 = R.sy[k];
  const dx = R.ex[k] - x0,
    dy = R.ey[k] - y0;
  const t = closestFraction(cx, cy, x0, y0, R.ex[k], R.ey[k]);
  const ux = cx - (x0 + t * dx),
    uy = cy - (y0 + t * dy);
  return ux * ux + uy * uy;
}

/**
 * Does body b's stand-in polygon surely cross side k of H: corners surely on both
 * sides of its line (margin tol[k], as the clip's float pass), and its chord on the
 * line surely overlapping the side between its ends (a margin of 1e-9 of its length)?
 */
function crossesSide(ob: ObstacleIndex, R: ViewRegion, k: number, b: number): boolean {
  const XY = ob.bodyHullXY;
  const first = ob.bodyHullStart[b],
    last = ob.bodyHullStart[b + 1] - 1;
  const x0 = R.sx[k],
    y0 = R.sy[k],
    dx = R.ex[k] - x0,
    dy = R.ey[k] - y0,
    tol = R.tol[k];
  const len2 = dx * dx + dy * dy;
  let lo = Infinity,
    hi = -Infinity,
    inside = false,
    outside = false;
  // Each side c -> c + 1 of the polygon (the last back to the first): where its
  // corners lie on opposite sides of the line, the crossing's fraction along side k.
  for (let c = first; c <= last; c++) {
    const n = c === last ? first : c + 1;
    const ax = XY[2 * c] - x0,
      ay = XY[2 * c + 1] - y0,
      bx = XY[2 * n] - x0,
      by = XY[2 * n + 1] - y0;
    const da = dx * ay - dy * ax,
      db = dx * by - dy * bx;
    if (da > tol) inside = true;
    else if (da < -tol) outside = true;
    if ((da > 0 && db < 0) || (da < 0 && db > 0)) {
      const f = da / (da - db);
      const u = ((ax + f * (bx - ax)) * dx + (ay + f * (by - ay)) * dy) / len2;
      if (u < lo) lo = u;
      if (u > hi) hi = u;
    }
  }
  return inside && outside && hi > 1e-9 && lo < 1 - 1e-9;
}
