// Which shapes a gesture (a drag) is changing now, and the shape layers that
// follow from it: shapes the drag leaves alone sit in layers that are not drawn
// again while it runs, so a pointer move redraws only what moves.
import { useMemo } from 'react';
import type { Shape } from '../../state/sketchFile';

const NONE: ReadonlySet<number> = new Set();

/** Indices of the shapes that differ from the gesture's start (the same Set while they stay the same). */
export function useLiveShapes(shapes: readonly Shape[], base: readonly Shape[] | null): ReadonlySet<number> {
  let key = '';
  if (base) shapes.forEach((shape, i) => (shape !== base[i] ? (key += `${i},`) : undefined));
  return useMemo(() => (key ? new Set(key.slice(0, -1).split(',').map(Number)) : NONE), [key]);
}

/**
 * The one shift (sketch units) that takes every live shape from the gesture's start
 * to now, when the gesture only moves them whole (same kind, names and radius; every
 * point and centre shifted alike, to a millionth of the shape's size); else null.
 * The names of such shapes are drawn once and moved as one group.
 */
export function liveShift(
  shapes: readonly Shape[],
  base: readonly Shape[] | null,
  live: ReadonlySet<number>,
): [number, number] | null {
  if (!base || live.size === 0) return null;
  let shift: [number, number] | null = null;
  for (const i of live) {
    const now = shapes[i],
      then = base[i];
    if (!now || !then || now.kind !== then.kind || !sameNames(now.surface, then.surface)) return null;
    const a = then.circle ? [then.circle.center] : then.points;
    const b = now.circle ? [now.circle.center] : now.points;
    if (a.length !== b.length || a.length === 0 || now.circle?.radius !== then.circle?.radius) return null;
    shift ??= [b[0][0] - a[0][0], b[0][1] - a[0][1]];
    const tol = 1e-6 * (size(a) + (then.circle?.radius ?? 0));
    for (let k = 0; k < a.length; k++) {
      if (Math.abs(b[k][0] - a[k][0] - shift[0]) > tol || Math.abs(b[k][1] - a[k][1] - shift[1]) > tol) return null;
    }
  }
  return shift;
}

function sameNames(a: Shape['surface'], b: Shape['surface']): boolean {
  if (a === b) return true;
  if (typeof a === 'string' || typeof b === 'string' || a.length !== b.length) return false;
  return a.every((name, k) => name === b[k]);
}

/** Largest coordinate extent of some points (sketch units). */
function size(points: readonly (readonly number[])[]): number {
  let minX = Infinity,
    maxX = -Infinity,
    minY = Infinity,
    maxY = -Infinity;
  for (const [x, y] of points) {
    minX = Math.min(minX, x);
    maxX = Math.max(maxX, x);
    minY = Math.min(minY, y);
    maxY = Math.max(maxY, y);
  }
  return Math.max(maxX - minX, maxY - minY, Math.abs(minX), Math.abs(minY));
}

export interface ShapeLayer {
  key: string;
  /** Shape indices, in drawing order. */
  shapes: number[];
}

/**
 * Enclosures are drawn below solids. Still shapes share one layer; a moving
 * solid goes in a layer above it. A moving enclosure must stay below the
 * solids, so then the still solids get a layer above it.
 */
export function shapeLayers(shapes: readonly Shape[], live: ReadonlySet<number>): ShapeLayer[] {
  const still: number[] = [];
  const liveEnclosures: number[] = [];
  const stillSolids: number[] = [];
  const liveSolids: number[] = [];
  shapes.forEach((shape, i) => {
    if (shape.kind === 'solid') (live.has(i) ? liveSolids : stillSolids).push(i);
    else (live.has(i) ? liveEnclosures : still).push(i);
  });
  const layers: ShapeLayer[] = [];
  if (liveEnclosures.length === 0) {
    layers.push({ key: 'still', shapes: [...still, ...stillSolids] });
  } else {
    layers.push({ key: 'still', shapes: still }, { key: 'live-enclosures', shapes: liveEnclosures });
    layers.push({ key: 'still-solids', shapes: stillSolids });
  }
  if (liveSolids.length) layers.push({ key: 'live-solids', shapes: liveSolids });
  return layers;
}
