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
