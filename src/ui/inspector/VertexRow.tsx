import { useAppStore } from '../AppContext';
import { setVertex } from '../../state/edits/shapeEdits';
import type { Point } from '../../state/sketchFile';
import { NumberField } from './NumberField';

/** x and y of one vertex, each edit one undo step. */
export function VertexRow({
  shape,
  index,
  point,
  units,
}: {
  shape: number;
  index: number;
  point: Point;
  units: string;
}) {
  const store = useAppStore();
  const set = (p: Point) => store.getState().edit((d) => setVertex(d, shape, index, p));
  return (
    <div className="vertex-row">
      <span className="vertex-label">point {index + 1}</span>
      <NumberField
        label={`x (${units})`}
        title={`x of point ${index + 1}, ${units}`}
        value={point[0]}
        onCommit={(x) => set([x, point[1]])}
        width="7.5em"
        precision={9}
      />
      <NumberField
        label={`y (${units})`}
        title={`y of point ${index + 1}, ${units}`}
        value={point[1]}
        onCommit={(y) => set([point[0], y])}
        width="7.5em"
        precision={9}
      />
    </div>
  );
}
