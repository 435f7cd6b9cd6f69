// Plain payloads between the app and the view-factor worker: typed arrays and
// numbers only, so they cross postMessage cheaply.
import type { SceneInput, ViewFactorResult } from '../core/scene';

export interface ViewFactorJob {
  polygons: { kind: 'enclosure' | 'solid'; points: Float64Array }[];
  edgeSurface: Int32Array;
  surfaceCount: number;
}

export interface ViewFactorApi {
  compute(job: ViewFactorJob): Promise<ViewFactorResult> | ViewFactorResult;
}

export function jobFromScene(scene: SceneInput): ViewFactorJob {
  return {
    polygons: scene.polygons.map((p) => ({ kind: p.kind, points: Float64Array.from(p.points) })),
    edgeSurface: Int32Array.from(scene.edgeSurface),
    surfaceCount: scene.surfaceCount,
  };
}
