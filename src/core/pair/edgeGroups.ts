import type { EdgeSet } from '../edges';
import type { ObstacleIndex } from '../obstacles';

// Groups of consecutive polygon edges with a bounding circle each, shared by every
// pair of an edge of one group with an edge of another (pairCandidates.ts lists their
// obstacles once, groupCull.ts shows a whole group silent to one edge). Sketch units.

/** Enclosure edges per group: short runs keep the circle, and so the lists, tight. */
const WALL_RUN = 8;

export interface EdgeGroups {
  /** Group of each polygon edge: body b is group b; enclosure runs follow. */
  groupOf: Int32Array;
  /** Per polygon edge, the index after the last edge of its group (a group's edges are consecutive). */
  groupEnd: Int32Array;
  /** Per group, the bounding circle: centre and radius (bodies: the body's own). */
  cx: Float64Array;
  cy: Float64Array;
  r: Float64Array;
}

/**
 * Groups of edges with their bounding circles: body b is group b (its circle from the
 * obstacle index); each enclosure polygon's edges follow in runs of WALL_RUN, each
 * run's circle about its corners' average (radius: the farthest corner, so it holds
 * every edge of the run, a chord of the circle).
 */
export function edgeGroups(E: EdgeSet, ob: ObstacleIndex): EdgeGroups {
  const groupOf = new Int32Array(E.count);
  const groupEnd = new Int32Array(E.count);
  const cx = Array.from(ob.bodyCx),
    cy = Array.from(ob.bodyCy),
    r = Array.from(ob.bodyR);
  for (let p = 0; p + 1 < E.polygonStart.length; p++) {
    const body = ob.bodyOfPolygon[p];
    const from = E.polygonStart[p],
      to = E.polygonStart[p + 1];
    if (body >= 0) {
      groupOf.fill(body, from, to);
      groupEnd.fill(to, from, to);
      continue;
    }
    for (let s = from; s < to; s += WALL_RUN) {
      const end = Math.min(to, s + WALL_RUN);
      let x = 0,
        y = 0;
      for (let k = s; k < end; k++) {
        x += E.ax[k] + E.bx[k];
        y += E.ay[k] + E.by[k];
      }
      x /= 2 * (end - s);
      y /= 2 * (end - s);
      let far = 0;
      for (let k = s; k < end; k++)
        far = Math.max(
          far,
          Math.sqrt((E.ax[k] - x) ** 2 + (E.ay[k] - y) ** 2),
          Math.sqrt((E.bx[k] - x) ** 2 + (E.by[k] - y) ** 2),
        );
      groupOf.fill(cx.length, s, end);
      groupEnd.fill(end, s, end);
      cx.push(x);
      cy.push(y);
      r.push(far);
    }
  }
  return { groupOf, groupEnd, cx: Float64Array.from(cx), cy: Float64Array.from(cy), r: Float64Array.from(r) };
}
