import type { CircleInput } from '../../../src/core/scene';
import { computeViewFactors } from '../../../src/core/viewFactors';
import { circleParts, polygonParts, type OracleScene } from './circleOracle';

/** Polygons as the tests write them: points as [x, y] pairs. */
export type SectionPolygon = { kind: 'enclosure' | 'solid'; points: number[][] };

/**
 * A section's parts for the ray-cast reference (circleOracle.ts) and the core's
 * factors for it, one surface per edge or arc: part k is the core's edge k (polygon
 * edges first, then the arcs). F is n x n, row = from.
 */
export function sectionFactors(
  polys: SectionPolygon[],
  circles: CircleInput[],
): { scene: OracleScene; F: Float64Array; n: number } {
  const scene: OracleScene = { parts: [], circles: [] };
  for (const p of polys) scene.parts.push(...polygonParts(p.kind, p.points));
  for (const c of circles) circleParts(scene, c.kind, c.cx, c.cy, c.radius, c.arcs);
  const n = scene.parts.length;
  const res = computeViewFactors({
    polygons: polys.map((p) => ({ kind: p.kind, points: p.points.flat() })),
    circles,
    edgeSurface: Array.from({ length: n }, (_, k) => k),
    surfaceCount: n,
  });
  return { scene, F: res.F, n };
}
