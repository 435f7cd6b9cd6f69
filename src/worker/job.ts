// Plain payloads between the app and the view-factor worker: typed arrays and
// numbers only, so they cross postMessage cheaply. The job is the geometry and
// nothing else: surface names, properties and units never reach the worker, so
// editing them never needs a job.
import type { CircleInput, PolygonInput } from '../core/scene';

export interface ViewFactorJob {
  polygons: { kind: 'enclosure' | 'solid'; points: Float64Array }[];
  /** Exact circles; their arcs are numbered after every polygon edge. */
  circles?: CircleInput[];
}

/** Edge-level view factors: the one costly stage, computed in the worker. */
export interface EdgeViewFactors {
  /** Polygon edges and arcs. */
  edgeCount: number;
  /** Edge lengths (area per unit depth), sketch units. */
  edgeLength: Float64Array;
  /** Edge view factors, row-major edgeCount x edgeCount; row = from. Dimensionless. */
  F: Float64Array;
  /** True when the sketch has an enclosure, so every row should sum to one. */
  closed: boolean;
}

export interface ViewFactorApi {
  compute(job: ViewFactorJob): Promise<EdgeViewFactors> | EdgeViewFactors;
}

export function jobFromPolygons(
  polygons: readonly PolygonInput[],
  circles: readonly CircleInput[] = [],
): ViewFactorJob {
  return {
    polygons: polygons.map((p) => ({ kind: p.kind, points: Float64Array.from(p.points) })),
    circles: circles.map((c) => ({ kind: c.kind, cx: c.cx, cy: c.cy, radius: c.radius, arcs: c.arcs })),
  };
}
