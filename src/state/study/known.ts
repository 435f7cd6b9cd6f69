// A study takes the view factors the results pipeline already holds instead of
// computing them again in its own worker (the pipeline spreads them over every
// worker; the study has one). Measured in Node: the sensitivity of a 3052-edge
// sketch took 542 ms computing them and 7 ms given them; 1012 edges 163 and 10 ms.
// Only for the geometry they were computed for: a case whose scene differs (a
// moved shape or tube row) computes its own.
import type { SceneInput, ViewFactorResult } from '../../core/scene';
import { sameEntries } from '../../core/sameEntries';
import type { ViewFactorsOf } from '../../document/study';

/** Do two scenes hold the same shapes (kinds, points, circles) and the same surface of every edge, exactly? */
export function sameScene(a: SceneInput, b: SceneInput): boolean {
  if (a.surfaceCount !== b.surfaceCount || !sameEntries(a.edgeSurface, b.edgeSurface)) return false;
  if (a.polygons.length !== b.polygons.length) return false;
  for (let p = 0; p < a.polygons.length; p++) {
    const pa = a.polygons[p],
      pb = b.polygons[p];
    if (pa.kind !== pb.kind || !sameEntries(pa.points, pb.points)) return false;
  }
  const ca = a.circles ?? [],
    cb = b.circles ?? [];
  if (ca.length !== cb.length) return false;
  for (let c = 0; c < ca.length; c++) {
    const x = ca[c],
      y = cb[c];
    if (x.kind !== y.kind || x.cx !== y.cx || x.cy !== y.cy || x.radius !== y.radius || x.arcs !== y.arcs) return false;
  }
  return true;
}

/** The view factors of a scene: `known` when it is `base` (the geometry they belong to), else `otherwise`'s. */
export function knownFactorsOf(base: SceneInput, known: ViewFactorResult, otherwise: ViewFactorsOf): ViewFactorsOf {
  return (scene) => (sameScene(scene, base) ? known : otherwise(scene));
}
