import { CurvedPairIntegrator } from './arc/curvedPair';
import { allEdgeLengths, buildEdges, totalEdgeCount, type EdgeSet } from './edges';
import { buildObstacleIndex } from './obstacles';
import { PairIntegrator } from './pair/integrator';
import type { SceneInput, ViewFactorResult } from './scene';
import { aggregateToSurfaces } from './surfaces';

export interface ViewFactorOptions {
  /**
   * Integrate every ordered pair on its own instead of filling F_ji from F_ij by
   * reciprocity. Twice the work; makes the reciprocity residual an independent check.
   */
  independentPairs?: boolean;
  /** Reuse this buffer (length >= edges^2) for the edge matrix. */
  edgeMatrix?: Float64Array;
}

/**
 * Edge-to-edge view factors of a sketch: row-major edges x edges, row = from.
 * F[i*n + j] is the fraction of diffuse emission from edge i (per unit depth) that
 * arrives at edge j unobstructed; dimensionless, exact to rounding.
 */
export function edgeViewFactors(edges: EdgeSet, options: ViewFactorOptions = {}): Float64Array {
  const n = totalEdgeCount(edges);
  const F = options.edgeMatrix && options.edgeMatrix.length >= n * n ? options.edgeMatrix : new Float64Array(n * n);
  F.fill(0, 0, n * n);
  const obstacles = buildObstacleIndex(edges);
  const straight = new PairIntegrator(edges, obstacles);
  // Sketches with exact circles: pairs with an arc, or with a solid circle near their
  // view, go through the curved integrator; polygon pairs keep the polygon one.
  const curved = edges.arcs.circleCount > 0 ? new CurvedPairIntegrator(edges, obstacles) : null;
  const integrator = curved
    ? {
        exchangeLength: (i: number, j: number) =>
          curved.needed(i, j) ? curved.exchangeLength(i, j) : straight.exchangeLength(i, j),
      }
    : straight;
  const L = edges.arcs.count > 0 ? allEdgeLengths(edges) : edges.length;
  for (let i = 0; i < n; i++) {
    if (L[i] === 0) continue;
    // Only a concave arc sees itself (straight edges and solid arcs never do).
    if (curved && i >= edges.count) {
      const g = curved.exchangeLength(i, i);
      if (g > 0) F[i * n + i] = g / L[i];
    }
    for (let j = i + 1; j < n; j++) {
      if (L[j] === 0) continue;
      // g = L_i F_ij = L_j F_ji. Integrating along the shorter edge keeps its rounding
      // error relative to that edge, so the factor from a tiny edge stays accurate.
      if (options.independentPairs) {
        F[i * n + j] = integrator.exchangeLength(i, j) / L[i];
        F[j * n + i] = integrator.exchangeLength(j, i) / L[j];
        continue;
      }
      const g = L[i] <= L[j] ? integrator.exchangeLength(i, j) : integrator.exchangeLength(j, i);
      // Every visible gap adds a non-negative amount, so g < 0 is rounding of an exact
      // zero (a grazing view, e.g. -1e-32): report it as no view.
      if (!(g > 0)) continue;
      F[i * n + j] = g / L[i];
      F[j * n + i] = g / L[j];
    }
  }
  return F;
}

/**
 * View factors between the named surfaces of a sketch (area-weighted sums of edge
 * factors, F_IJ = sum_{i in I, j in J} L_i F_ij / L_I), with the enclosure-rule and
 * reciprocity residuals. Lengths are in sketch units; factors are dimensionless.
 */
export function computeViewFactors(scene: SceneInput, options: ViewFactorOptions = {}): ViewFactorResult {
  const edges = buildEdges(scene.polygons, scene.circles);
  const n = totalEdgeCount(edges);
  if (scene.edgeSurface.length !== n) {
    throw new Error(`edgeSurface has ${scene.edgeSurface.length} entries for ${n} edges`);
  }
  const F = edgeViewFactors(edges, options);
  return aggregateToSurfaces(n, allEdgeLengths(edges), F, scene.edgeSurface, scene.surfaceCount, edges.hasEnclosure);
}
