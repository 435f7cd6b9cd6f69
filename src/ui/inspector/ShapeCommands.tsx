import { useState } from 'react';
import { useApp, useController } from '../AppContext';
import type { AppState } from '../../state/store';
import { NumberField } from './NumberField';
import { direction } from '../../state/tools/typedEntry';
import { COORDINATE_RULE } from '../../state/edits/numberInput';
import { MAX_REPEAT } from '../../state/edits/shapeCopies';

const selectHasClipboard = (s: AppState) => s.clipboard !== null;
const selectUnits = (s: AppState) => s.doc.units;

/** Copy, paste, duplicate, move by an offset, flip and repeat for the selected shapes. */
export function ShapeCommands({ shapes }: { shapes: number }) {
  const controller = useController();
  const canPaste = useApp(selectHasClipboard);
  const u = useApp(selectUnits);
  const [dx, setDx] = useState(0);
  const [dy, setDy] = useState(0);
  const [count, setCount] = useState(3);
  const [pitch, setPitch] = useState(0.3);
  const [angle, setAngle] = useState(0);
  const which = shapes === 1 ? 'the selected shape' : `the ${shapes} selected shapes`;
  return (
    <div className="item shape-commands">
      <h3>Shapes</h3>
      <div className="row">
        <button type="button" disabled={!shapes} title={`Copy ${which} (Ctrl+C)`} onClick={() => controller.copy()}>
          Copy
        </button>
        <button
          type="button"
          disabled={!canPaste}
          title="Paste the copied shapes one grid step right and down (Ctrl+V)"
          onClick={() => controller.paste()}
        >
          Paste
        </button>
        <button
          type="button"
          disabled={!shapes}
          title={`Copy ${which} one grid step right and down (Ctrl+D)`}
          onClick={() => controller.duplicate()}
        >
          Duplicate
        </button>
        <button
          type="button"
          disabled={!shapes}
          title={`Mirror ${which} left to right about their middle`}
          onClick={() => controller.flip('left-right')}
        >
          Flip left–right
        </button>
        <button
          type="button"
          disabled={!shapes}
          title={`Mirror ${which} top to bottom about their middle`}
          onClick={() => controller.flip('upside-down')}
        >
          Flip upside down
        </button>
      </div>
      <div className="row">
        <NumberField
          label={`dx (${u})`}
          title="Move right by"
          value={dx}
          onCommit={setDx}
          rule={COORDINATE_RULE}
          width="5em"
        />
        <NumberField
          label={`dy (${u})`}
          title="Move up by"
          value={dy}
          onCommit={setDy}
          rule={COORDINATE_RULE}
          width="5em"
        />
        <button
          type="button"
          title="Move what is selected by dx, dy (one undo step)"
          onClick={() => controller.moveBy(dx, dy)}
        >
          Move by
        </button>
      </div>
      <div className="row">
        <NumberField
          label="copies"
          title={`Number of copies (1 to ${MAX_REPEAT})`}
          value={count}
          onCommit={setCount}
          rule={{ min: 1, max: MAX_REPEAT, integer: true }}
          width="3.5em"
        />
        <NumberField
          label={`pitch (${u})`}
          title="Distance between one copy and the next"
          value={pitch}
          onCommit={setPitch}
          rule={{ min: 0, minExclusive: true, max: 1e100 }}
          width="5em"
        />
        <NumberField
          label="angle (°)"
          title="Direction of the copies, degrees anticlockwise from the +x axis (0 is to the right, 90 up)"
          value={angle}
          onCommit={setAngle}
          rule={{ min: -360, max: 360 }}
          width="4em"
        />
        <button
          type="button"
          disabled={!shapes}
          title={`Repeat ${which}: copies at the pitch along the angle`}
          onClick={() => controller.repeat(count, pitch, direction(angle))}
        >
          Repeat
        </button>
      </div>
    </div>
  );
}
