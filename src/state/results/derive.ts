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
let lastCache: ViewFactorCache | null = null;
let lastShown: ShownResult | null = null;

/**
 * Surface-factor matrices of answers that left the store (retireSurfaceFactors),
 * reused for the next sums: a fresh 1012 x 1012 array (8 MB) costs Chromium's
 * main thread 30-50 ms on the development machine, every page of it a fault, a
 * reused one about 1 ms. Two are enough: one answer is retired per answer filed.
 */
const spares: Float64Array[] = [];
const MAX_SPARES = 2;
/** Smallest matrix worth reusing (64 surfaces, 32 kB): smaller ones cost little to make. */
export const REUSE_FROM = 4096;
/** The matrices made from each answer, handed to `spares` when it is retired. */
const made = new WeakMap<ViewFactorAnswer, Float64Array[]>();

function spareOf(length: number): Float64Array | undefined {
  if (length < REUSE_FROM) return undefined;
  const k = spares.findIndex((b) => b.length === length);
  return k < 0 ? undefined : spares.splice(k, 1)[0];
}

/**
 * An answer no screen, stage or cache reads any more (the pipeline retires it one
 * answer after it left the store): its surface sums are forgotten, so they are
 * never served again, and their matrices are reused by the next sums.
 */
export function retireSurfaceFactors(answer: ViewFactorAnswer): void {
  sums.delete(answer);
  const buffers = made.get(answer);
  made.delete(answer);
  if (!buffers) return;
  // Never reuse what the shown result still holds (it is derived from newer answers, but be sure).
  if (lastShown && buffers.includes(lastShown.result.F)) lastCache = lastShown = null;
  spares.push(...buffers);
  if (spares.length > MAX_SPARES) spares.splice(0, spares.length - MAX_SPARES);
}

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
  const m = surfaces.names.length;
  const result = aggregatePackedRows(
    edges.edgeLength,
    edges.rows,
    surfaces.edgeSurface,
    m,
    edges.closed,
    lengths,
    spareOf(m * m),
  );
  bySurfaces.set(surfaces, { scale, result });
  if (result.F.length >= REUSE_FROM) {
    // The newest two per answer: older ones (renames of a held answer) are left to the collector, never reused.
    const list = [...(made.get(edges) ?? []), result.F].slice(-MAX_SPARES);
    made.set(edges, list);
  }
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
