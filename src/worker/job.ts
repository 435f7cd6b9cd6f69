// Plain payloads between the app and the view-factor workers: typed arrays and
// numbers only, so they cross postMessage cheaply. The job is the geometry and
// nothing else: surface names, properties and units never reach the workers, so
// editing them never needs a job. The one exception is a sketch whose edge matrix
// would pass the core's budget (above 5000 edges): its job carries the surface
// index and comes back as surface sums, so a rename or regroup there needs a job.
import type { PackedRows } from '../core/pairRows';
import type { SurfaceRowSums } from '../core/surfaceRows';
import type { CircleInput, PolygonInput } from '../core/scene';
import { sceneEdgeCount } from '../core/edges';
import { edgeMatrixFits } from '../core/viewFactors';

export interface ViewFactorJob {
  polygons: { kind: 'enclosure' | 'solid'; points: Float64Array }[];
  /** Exact circles; their arcs are numbered after every polygon edge. */
  circles?: CircleInput[];
  /** Only for sketches past the edge-matrix budget: sum straight to these surfaces. */
  surfaces?: JobSurfaces;
  /** Posted while a shape follows the pointer: the pool leaves one core to the page (pool.ts, workersForJob). */
  duringGesture?: boolean;
}

/** Surface of every edge (0..count-1), edges in the core's order. */
export interface JobSurfaces {
  edgeSurface: Int32Array;
  count: number;
}

/** Edge-level view factors: the one costly stage, computed in the workers. */
export interface EdgeViewFactors {
  /** Polygon edges and arcs. */
  edgeCount: number;
  /** Edge lengths (area per unit depth), sketch units. */
  edgeLength: Float64Array;
  /**
   * Exchange lengths g_ij (sketch units) of every pair, packed row by row as the
   * workers computed them: F_ij = g_ij / L_i. Kept packed (half the numbers, no
   * fresh edges^2 matrix per job); unpackRows (core pairRows.ts) makes the matrix of it.
   */
  rows: PackedRows;
  /** True when the sketch has an enclosure, so every row should sum to one. */
  closed: boolean;
}

/** Surface sums of a sketch past the edge-matrix budget (no edge matrix). */
export interface SurfaceViewFactors {
  edgeCount: number;
  /** Edge lengths, sketch units. */
  edgeLength: Float64Array;
  /** The surface index the sums were taken for. */
  edgeSurface: Int32Array;
  surfaceCount: number;
  /** Surface lengths (sum of their edges), sketch units. */
  surfaceLength: Float64Array;
  /** G_IJ = L_I F_IJ, row-major surfaceCount x surfaceCount, sketch units. */
  exchange: Float64Array;
  closed: boolean;
}

/** What a job answers: edge factors, or (past the budget) surface sums. */
export type ViewFactorAnswer = EdgeViewFactors | SurfaceViewFactors;

/** True when surface sums were taken for this surface index (same surface of every edge; names do not matter). */
export function sumsFitSurfaces(r: SurfaceViewFactors, edgeSurface: ArrayLike<number>, count: number): boolean {
  if (r.surfaceCount !== count || r.edgeSurface.length !== edgeSurface.length) return false;
  for (let i = 0; i < edgeSurface.length; i++) if (r.edgeSurface[i] !== edgeSurface[i]) return false;
  return true;
}

/** One worker's share of a job: packed exchange lengths of its rows (see core pairRows.ts), or their surface sums. */
export type RowsAnswer =
  | {
      kind: 'matrix';
      edgeLength: Float64Array;
      closed: boolean;
      rows: Int32Array;
      packed: Float64Array;
      /** Pairs computed for this answer; the others were copied from the worker's previous answer. */
      computed: number;
      /** Time the worker spent on these rows, ms (set by a worker's API, not by computeRows). */
      elapsedMs?: number;
    }
  | { kind: 'surfaces'; edgeLength: Float64Array; closed: boolean; sums: SurfaceRowSums; elapsedMs?: number };

export interface ViewFactorApi {
  compute(job: ViewFactorJob): Promise<ViewFactorAnswer> | ViewFactorAnswer;
  /** The pairs of the given rows (ascending), for a pool sharing one job. */
  computeRows(job: ViewFactorJob, rows: Int32Array): Promise<RowsAnswer> | RowsAnswer;
  /** Packed-row buffers of answers the page no longer holds, handed back to fill later answers. */
  recycle(buffers: Float64Array[]): Promise<void> | void;
}

export function isSurfaceAnswer(r: ViewFactorAnswer): r is SurfaceViewFactors {
  return 'exchange' in r;
}

/** Edges in a job's matrix: polygon edges, then arcs. */
export function jobEdgeCount(job: ViewFactorJob): number {
  return sceneEdgeCount(job.polygons, job.circles);
}

/** True when a sketch of this many edges is computed as surface sums (its edge matrix would pass the budget). */
export function needsSurfaceJob(edgeCount: number): boolean {
  return !edgeMatrixFits(edgeCount);
}

/**
 * How many times the base time limit a job may take: 1 up to 2000 edges, then
 * growing with the pairs (20,000 edges: 100 times), so only a hang trips it.
 */
export function jobTimeScale(job: ViewFactorJob): number {
  const n = jobEdgeCount(job);
  return Math.max(1, (n / 2000) ** 2);
}

export function jobFromPolygons(
  polygons: readonly PolygonInput[],
  circles: readonly CircleInput[] = [],
  surfaces?: JobSurfaces,
): ViewFactorJob {
  const job: ViewFactorJob = {
    polygons: polygons.map((p) => ({ kind: p.kind, points: Float64Array.from(p.points) })),
    circles: circles.map((c) => ({ kind: c.kind, cx: c.cx, cy: c.cy, radius: c.radius, arcs: c.arcs })),
  };
  if (surfaces) job.surfaces = { edgeSurface: Int32Array.from(surfaces.edgeSurface), count: surfaces.count };
  return job;
}
