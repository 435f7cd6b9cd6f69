import { useState } from 'react';
import { useApp, useController } from '../AppContext';
import type { AppState } from '../../state/store';
import { NumberField } from './NumberField';
import { COORDINATE_RULE } from '../../state/edits/numberInput';
import { MAX_ROW, type TubeRow } from '../../state/edits/tubeRow';

const selectUnits = (s: AppState) => s.doc.units;

/**
 * A tube row's numbers. Each value confirmed changes the row at once, as one
 * undo step, and its tubes follow (those that stay keep their names and
 * properties); "Split row into tubes" keeps the tubes and forgets the row.
 */
export function RowEditor({ name, row }: { name: string; row: TubeRow }) {
  const controller = useController();
  const u = useApp(selectUnits);
  const [problem, setProblem] = useState<string | null>(null);
  const change = (next: TubeRow) => setProblem(controller.editRow(name, next));
  const positive = { min: 0, minExclusive: true, max: 1e100 };
  const from = row.from;
  return (
    <div className="item tube-row">
      <h3>Tube row {name}</h3>
      <div className="row">
        <NumberField
          label="tubes"
          title={`Number of tubes (1 to ${MAX_ROW}); tubes are added or removed at the row's end`}
          value={row.count}
          onCommit={(count) => change({ ...row, count })}
          rule={{ min: 1, max: MAX_ROW, integer: true }}
          width="3.5em"
        />
        <NumberField
          label={`diameter (${u})`}
          title="Outer diameter of each tube"
          value={row.diameter}
          onCommit={(diameter) => change({ ...row, diameter })}
          rule={positive}
          width="5em"
        />
        <NumberField
          label={`pitch (${u})`}
          title="Centre to centre"
          value={row.pitch}
          onCommit={(pitch) => change({ ...row, pitch })}
          rule={positive}
          width="5em"
        />
      </div>
      {'wall' in from ? (
        <div className="row">
          <NumberField
            label={`from '${from.wall}' (${u})`}
            title={`Distance from the wall '${from.wall}' to the tubes' centre line; the row is centred along the wall`}
            value={from.distance}
            onCommit={(distance) => change({ ...row, from: { ...from, distance } })}
            rule={positive}
            width="5em"
          />
        </div>
      ) : (
        <div className="row">
          <NumberField
            label={`centre x (${u})`}
            title="x of the first tube's centre"
            value={from.start[0]}
            onCommit={(x) => change({ ...row, from: { ...from, start: [x, from.start[1]] } })}
            rule={COORDINATE_RULE}
            width="5em"
          />
          <NumberField
            label={`centre y (${u})`}
            title="y of the first tube's centre"
            value={from.start[1]}
            onCommit={(y) => change({ ...row, from: { ...from, start: [from.start[0], y] } })}
            rule={COORDINATE_RULE}
            width="5em"
          />
          <NumberField
            label="angle (°)"
            title="Direction of the row, degrees anticlockwise from +x"
            value={from.angle}
            onCommit={(angle) => change({ ...row, from: { ...from, angle } })}
            rule={{ min: -360, max: 360 }}
            width="4em"
          />
        </div>
      )}
      <p className="hint">Change a number and the tubes follow (one undo step each).</p>
      <button
        type="button"
        title="Keep the tubes where they are as single tubes, each its own surface; the row's numbers are forgotten"
        onClick={() => {
          setProblem(null);
          controller.splitRow(name);
        }}
      >
        Split row into tubes
      </button>
      {problem && (
        <p className="field-problem" role="alert">
          Not changed: {problem}.
        </p>
      )}
    </div>
  );
}
