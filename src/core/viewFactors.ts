import { allEdgeLengths, buildEdges, totalEdgeCount, type EdgeSet } from './edges';
import { EdgePairs, fillRows } from './pairRows';
import type { SceneInput, ViewFactorResult } from './scene';
import { aggregateToSurfaces } from './surfaces';
import { surfaceFactorsFromPairs } from './surfaceRows';

export interface ViewFactorOptions {
  /**
   * Integrate every ordered pair on its own instead of filling F_ji from F_ij by
   * reciprocity. Twice the work; makes the reciprocity residual an independent check.
   */
  independentPairs?: boolean;
  /** Reuse this buffer (length >= edges^2) for the edge matrix. */
  edgeMatrix?: Float64Array;
  /**
   * Write the surface factors into this buffer when it holds exactly surfaces^2
   * doubles (it becomes the result's F; other lengths are not used). For a caller
   * done with an earlier result: fresh memory costs tens of ms per 10 MB here.
   */
  surfaceMatrix?: Float64Array;
}

/**
 * Largest edge matrix kept, in bytes (5000 edges: 200 MB of doubles). Above it,
 * surface factors are summed straight from the pairs (`surfaceFactorsFromPairs`),
 * in memory that grows with surfaces^2 instead of edges^2.
 */
export const EDGE_MATRIX_BUDGET_BYTES = 200_000_000;

/** True when an edges x edges matrix of doubles fits `EDGE_MATRIX_BUDGET_BYTES`. */
export function edgeMatrixFits(edgeCount: number): boolean {
  return edgeCount * edgeCount * 8 <= EDGE_MATRIX_BUDGET_BYTES;
}

/**
 * Edge-to-edge view factors of a sketch: row-major edges x edges, row = from.
 * F[i*n + j] is the fraction of diffuse emission from edge i (per unit depth) that
 * arrives at edge j unobstructed; dimensionless, exact to rounding. This is the
 * one-thread case of the row API in pairRows.ts: every row, in one thread.
 */
export function edgeViewFactors(edges: EdgeSet, options: ViewFactorOptions = {}): Float64Array {
  const n = totalEdgeCount(edges);
  const F = options.edgeMatrix && options.edgeMatrix.length >= n * n ? options.edgeMatrix : new Float64Array(n * n);
  F.fill(0, 0, n * n);
  const pairs = new EdgePairs(edges);
  if (!options.independentPairs) {
    fillRows(pairs, allRows(n), F);
    return F;
  }
  const L = pairs.length;
  for (let i = 0; i < n; i++) {
    if (L[i] === 0) continue;
    const self = pairs.selfExchange(i);
    if (self > 0) F[i * n + i] = self / L[i];
    for (let j = i + 1; j < n; j++) {
      if (L[j] === 0) continue;
      F[i * n + j] = pairs.exchangeLength(i, j) / L[i];
      F[j * n + i] = pairs.exchangeLength(j, i) / L[j];
    }
  }
  return F;
}

/** The rows 0 .. n-1. */
export function allRows(n: number): Int32Array {
  const rows = new Int32Array(n);
  for (let i = 0; i < n; i++) rows[i] = i;
  return rows;
}

/**
 * View factors between the named surfaces of a sketch (area-weighted sums of edge
 * factors, F_IJ = sum_{i in I, j in J} L_i F_ij / L_I), with the enclosure-rule and
 * reciprocity residuals. Lengths are in sketch units; factors are dimensionless.
 * Sketches whose edge matrix would pass `EDGE_MATRIX_BUDGET_BYTES` are summed
 * straight from the pairs (equal to rounding, about 1e-16 relative).
 */
export function computeViewFactors(scene: SceneInput, options: ViewFactorOptions = {}): ViewFactorResult {
  const edges = buildEdges(scene.polygons, scene.circles);
  const n = totalEdgeCount(edges);
  if (scene.edgeSurface.length !== n) {
    throw new Error(`edgeSurface has ${scene.edgeSurface.length} entries for ${n} edges`);
  }
  if (!edgeMatrixFits(n) && !options.independentPairs && !options.edgeMatrix) {
    return surfaceFactorsFromPairs(new EdgePairs(edges), scene.edgeSurface, scene.surfaceCount, edges.hasEnclosure);
  }
  const F = edgeViewFactors(edges, options);
  return aggregateToSurfaces(
    n,
    allEdgeLengths(edges),
    F,
    scene.edgeSurface,
    scene.surfaceCount,
    edges.hasEnclosure,
    options.surfaceMatrix,
  );
}
