import { useAppStore } from '../AppContext';
import { setCircle } from '../../state/edits/shapeEdits';
import { DIAMETER_RULE } from '../../state/edits/numberInput';
import type { Shape } from '../../state/sketchFile';
import { NumberField } from './NumberField';

/** Centre x, y and diameter of an exact circle, each edit one undo step. */
export function CircleRow({
  shape,
  circle,
  units,
}: {
  shape: number;
  circle: NonNullable<Shape['circle']>;
  units: string;
}) {
  const store = useAppStore();
  const { center, radius } = circle;
  const set = (x: number, y: number, r: number) => store.getState().edit((d) => setCircle(d, shape, [x, y], r));
  return (
    <div className="vertex-row">
      <span className="vertex-label">centre</span>
      <NumberField
        label={`x (${units})`}
        title={`x of the centre, ${units}`}
        value={center[0]}
        onCommit={(x) => set(x, center[1], radius)}
        width="7.5em"
        precision={9}
      />
      <NumberField
        label={`y (${units})`}
        title={`y of the centre, ${units}`}
        value={center[1]}
        onCommit={(y) => set(center[0], y, radius)}
        width="7.5em"
        precision={9}
      />
      <NumberField
        label={`diameter (${units})`}
        title={`Diameter of the circle, ${units} (more than 0)`}
        value={2 * radius}
        rule={DIAMETER_RULE}
        onCommit={(d) => set(center[0], center[1], d / 2)}
        width="7.5em"
        precision={9}
      />
    </div>
  );
}
