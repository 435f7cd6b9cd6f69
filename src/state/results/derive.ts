// The cheap stages of the results pipeline, pure and cached on exactly their
// inputs: edge factors + surface index -> surface factors (a rename or a group
// redoes only this sum); the one staleness rule; the table numbers.
import { aggregatePackedRows } from '../../core/packedSurfaces';
import { surfaceResult } from '../../core/surfaces';
import type { ViewFactorResult } from '../../core/scene';
import type { SurfaceIndex } from '../../document/surfaceIndex';
import { isSurfaceAnswer, sumsFitSurfaces, type SurfaceViewFactors, type ViewFactorAnswer } from '../../worker/job';
import type { CheckedSketch } from '../documentApi';
import type { Units } from '../sketchFile';
import { scaleBetween } from './geometry';
import type { ViewFactorCache } from './slice';

/** Surface-level view factors as screens and exports show them. */
export interface ShownResult {
  /** Surface names in table order (names[i] is row i). */
  names: readonly string[];
  result: ViewFactorResult;
  /** Units of `result`'s lengths. */
  units: Units;
  /** The checked sketch whose surface properties and settings go with these factors. */
  sketch: CheckedSketch;
  /** True when the factors are not for the current document's geometry (one step behind, or the last valid sketch). */
  stale: boolean;
  /** Wall-clock time of the worker job, ms. */
  elapsedMs: number;
}

const sums = new WeakMap<ViewFactorAnswer, WeakMap<SurfaceIndex, { scale: number; result: ViewFactorResult }>>();

/**
 * Surface factors from edge factors: F_IJ = sum L_i F_ij / L_I over the edges of
 * I and J. `scale` multiplies the edge lengths (a geometry that is the computed
 * one scaled, e.g. after a change of units); the factors do not change.
 */
export function surfaceFactors(edges: ViewFactorAnswer, surfaces: SurfaceIndex, scale = 1): ViewFactorResult {
  let bySurfaces = sums.get(edges);
  if (!bySurfaces) sums.set(edges, (bySurfaces = new WeakMap()));
  const hit = bySurfaces.get(surfaces);
  if (hit && hit.scale === scale) return hit.result;
  if (isSurfaceAnswer(edges)) {
    const result = scaledSums(edges, surfaces, scale);
    bySurfaces.set(surfaces, { scale, result });
    return result;
  }
  const lengths = scale === 1 ? edges.edgeLength : edges.edgeLength.map((L) => L * scale);
  const result = aggregatePackedRows(
    edges.edgeLength,
    edges.rows,
    surfaces.edgeSurface,
    surfaces.names.length,
    edges.closed,
    lengths,
  );
  bySurfaces.set(surfaces, { scale, result });
  return result;
}

/**
 * Surface sums taken in the workers (sketches past the edge-matrix budget): they
 * fit only the surface index they were taken for; names may differ. F is G / L
 * from the unscaled sums, so a change of units leaves every factor as it was.
 */
function scaledSums(r: SurfaceViewFactors, surfaces: SurfaceIndex, scale: number): ViewFactorResult {
  if (!sumsFitSurfaces(r, surfaces.edgeSurface, surfaces.names.length))
    throw new Error('surface sums were taken for another surface index');
  const result = surfaceResult(r.edgeCount, r.edgeLength, r.surfaceLength, r.exchange, r.closed);
  if (scale === 1) return result;
  return {
    ...result,
    edgeLength: r.edgeLength.map((L) => L * scale),
    surfaceLength: r.surfaceLength.map((L) => L * scale),
  };
}

/** True when the answer can be summed to these surfaces (edge factors always can). */
export function answerFitsSurfaces(r: ViewFactorAnswer, surfaces: SurfaceIndex): boolean {
  return !isSurfaceAnswer(r) || sumsFitSurfaces(r, surfaces.edgeSurface, surfaces.names.length);
}

let lastCache: ViewFactorCache | null = null;
let lastShown: ShownResult | null = null;

/**
 * What is on screen: the newest edge factors summed to surfaces. When they were
 * computed for the current geometry (up to scale; for surface sums, and the same
 * surface of every edge), the current names, units and properties go with them;
 * otherwise those of the sketch they were computed for, and they are stale. This
 * is the only staleness rule.
 */
export function shownResult(vf: ViewFactorCache): ShownResult | null {
  if (vf === lastCache) return lastShown;
  lastCache = vf;
  lastShown = deriveShown(vf);
  return lastShown;
}

function deriveShown(vf: ViewFactorCache): ShownResult | null {
  const edges = vf.edges;
  if (!edges) return null;
  const current = vf.current;
  // Surface sums (past the edge-matrix budget) fit the current sketch only while its surface index is theirs.
  const scale =
    current && answerFitsSurfaces(edges.result, current.surfaces) ? scaleBetween(edges.basis.key, current.key) : null;
  const basis = current && scale !== null ? current : edges.basis;
  return {
    names: basis.surfaces.names,
    result: surfaceFactors(edges.result, basis.surfaces, scale ?? 1),
    units: basis.sketch.units,
    sketch: basis.sketch,
    stale: scale === null,
    elapsedMs: edges.elapsedMs,
  };
}
