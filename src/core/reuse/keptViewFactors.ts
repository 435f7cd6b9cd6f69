// View factors of one sketch after another, keeping the pairs the change cannot
// touch: a study that moves a shape (a tube's position, a row) solves one case
// after another with the same shapes, as a drag does, so each case computes only
// the pairs a moved shape may change (movedShapes.ts) and copies the rest. The
// surface factors are those of computeViewFactors, bit for bit: every pair is
// the same pure function of its sketch (pairRows.ts), and packed rows sum to
// surfaces with aggregateToSurfaces's very numbers (packedSurfaces.ts).
import { buildEdges, totalEdgeCount } from '../edges';
import { aggregatePackedRows } from '../packedSurfaces';
import { EdgePairs } from '../pairRows';
import type { SceneInput, ViewFactorResult } from '../scene';
import { allRows, computeViewFactors, edgeMatrixFits } from '../viewFactors';
import { packedRowsAfter } from './reuseRows';

/** Most packed pairs kept for the next sketch (64 MB, about 4000 edges); past it every case computes every pair. */
export const MAX_KEPT_PAIRS = 1 << 23;

/** The last sketch's pair integrators and packed rows (every row, see packRows). */
export class KeptViewFactors {
  private pairs: EdgePairs | null = null;
  private packed: Float64Array | null = null;
  /** Pairs computed by the last call (information: the rest were kept). */
  computed = 0;

  /**
   * Surface view factors of `scene` (dimensionless; lengths in sketch units), equal
   * bit for bit to computeViewFactors(scene). When the last scene had the same
   * shapes and only some solids or circles moved, only the pairs they may change
   * are computed.
   */
  compute(scene: SceneInput): ViewFactorResult {
    const edges = buildEdges(scene.polygons, scene.circles);
    const n = totalEdgeCount(edges);
    const rows = allRows(n);
    if (scene.edgeSurface.length !== n || !edgeMatrixFits(n) || (n * (n + 1)) / 2 > MAX_KEPT_PAIRS) {
      this.pairs = this.packed = null;
      this.computed = (n * (n + 1)) / 2;
      return computeViewFactors(scene);
    }
    const pairs = new EdgePairs(edges);
    // Taken, not shared: a call that throws half way leaves no half-updated rows behind.
    const earlier = this.pairs && this.packed ? { pairs: this.pairs, packed: this.packed } : null;
    this.pairs = this.packed = null;
    const { packed, computed } = packedRowsAfter(earlier, pairs, rows);
    this.computed = computed;
    const result = aggregatePackedRows(
      pairs.length,
      { sets: [rows], packed: [packed] },
      scene.edgeSurface,
      scene.surfaceCount,
      edges.hasEnclosure,
    );
    this.pairs = pairs;
    this.packed = packed;
    return result;
  }
}
