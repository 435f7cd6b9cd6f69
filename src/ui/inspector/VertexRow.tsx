import { memo } from 'react';
import { useAppStore } from '../AppContext';
import { setVertex } from '../../state/edits/shapeEdits';
import type { Point } from '../../state/sketchFile';
import { NumberField } from './NumberField';

interface Props {
  shape: number;
  index: number;
  point: Point;
  units: string;
}

/**
 * x and y of one vertex, each edit one undo step. Drawn again only when its numbers
 * change (every render rewrites an input's attributes, and a 48-gon has 96 of them).
 */
export const VertexRow = memo(VertexRowFields, (a: Props, b: Props) => {
  return (
    a.shape === b.shape &&
    a.index === b.index &&
    a.units === b.units &&
    a.point[0] === b.point[0] &&
    a.point[1] === b.point[1]
  );
});

function VertexRowFields({ shape, index, point, units }: Props) {
  const store = useAppStore();
  // The other coordinate is read from the document at commit time, not from this render's props.
  const set = (axis: 0 | 1, v: number) =>
    store.getState().edit((d) => {
      const now = d.shapes[shape]?.points[index];
      return now ? setVertex(d, shape, index, axis === 0 ? [v, now[1]] : [now[0], v]) : d;
    });
  return (
    <div className="vertex-row">
      <span className="vertex-label">point {index + 1}</span>
      <NumberField
        label={`x (${units})`}
        title={`x of point ${index + 1}, ${units}`}
        value={point[0]}
        onCommit={(x) => set(0, x)}
        width="7.5em"
        precision={9}
      />
      <NumberField
        label={`y (${units})`}
        title={`y of point ${index + 1}, ${units}`}
        value={point[1]}
        onCommit={(y) => set(1, y)}
        width="7.5em"
        precision={9}
      />
    </div>
  );
}
