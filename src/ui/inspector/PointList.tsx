import { useState } from 'react';
import type { Point } from '../../state/sketchFile';
import { VertexRow } from './VertexRow';

/** Above this many points a shape's number fields stay folded until asked for. */
export const LONG_POINT_LIST = 16;

/**
 * A shape's points as number fields. A long list (a tube drawn as a 48-gon) is
 * folded at first: its fields are seldom edited one by one, and while the shape is
 * dragged every one of them would be laid out again on each pointer move.
 */
export function PointList({ shape, points, units }: { shape: number; points: readonly Point[]; units: string }) {
  const long = points.length > LONG_POINT_LIST;
  const [open, setOpen] = useState(!long);
  return (
    <>
      {long && (
        <button type="button" aria-expanded={open} onClick={() => setOpen(!open)}>
          {open ? 'Hide the points' : `Show the ${points.length} points`}
        </button>
      )}
      {open && (
        <div className="vertex-list">
          {points.map((q, k) => (
            <VertexRow key={k} shape={shape} index={k} point={q} units={units} />
          ))}
        </div>
      )}
    </>
  );
}
