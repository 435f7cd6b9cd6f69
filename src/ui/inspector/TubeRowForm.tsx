import { useState } from 'react';
import { useApp, useController } from '../AppContext';
import type { AppState } from '../../state/store';
import { NumberField } from './NumberField';
import { COORDINATE_RULE } from '../../state/edits/numberInput';
import { MAX_ROW, selectedRow } from '../../state/edits/tubeRow';
import { RowEditor } from './RowEditor';

const selectUnits = (s: AppState) => s.doc.units;
/** The one enclosure edge selected, as the wall a row is measured from. */
const selectWall = (s: AppState): { shape: number; edge: number } | null => {
  const edges = s.selection.filter((p) => p.type === 'edge');
  if (edges.length !== 1 || edges[0].type !== 'edge') return null;
  return s.doc.shapes[edges[0].shape]?.kind === 'enclosure' ? { shape: edges[0].shape, edge: edges[0].index } : null;
};
/** The wall as a key, so the form re-renders only when another wall is chosen. */
const selectWallKey = (s: AppState): string => {
  const w = selectWall(s);
  return w ? `${w.shape}:${w.edge}` : '';
};

/** The row the selected tubes belong to, by name (null unless every pick is a tube of one row). */
const selectRowName = (s: AppState): string | null => selectedRow(s.doc, s.selection);

/**
 * The tube row: with a row's tubes selected, that row's numbers to change (its
 * tubes follow) and the command to split it; otherwise a new row.
 */
export function TubeRowForm() {
  const name = useApp(selectRowName);
  const row = useApp((s: AppState) => (name !== null ? s.doc.rows?.[name] : undefined));
  return name !== null && row ? <RowEditor name={name} row={row} /> : <NewRowForm />;
}

/**
 * A new tube row: n tubes of diameter D at a pitch centre to centre, either a
 * distance from the selected wall (to the centre line, the row centred along
 * the wall) or from a start point along an angle.
 */
function NewRowForm() {
  const controller = useController();
  const u = useApp(selectUnits);
  const wallKey = useApp(selectWallKey);
  const wall = wallKey ? { shape: Number(wallKey.split(':')[0]), edge: Number(wallKey.split(':')[1]) } : null;
  const [count, setCount] = useState(4);
  const [diameter, setDiameter] = useState(0.1143);
  const [pitch, setPitch] = useState(0.3);
  const [distance, setDistance] = useState(0.3);
  const [x, setX] = useState(0);
  const [y, setY] = useState(0);
  const [angle, setAngle] = useState(0);
  const [problem, setProblem] = useState<string | null>(null);
  const place = () => {
    const spec = { count, diameter, pitch };
    setProblem(
      controller.addRow(
        spec,
        wall ? { from: 'wall', shape: wall.shape, edge: wall.edge, distance } : { from: 'point', start: [x, y], angle },
      ),
    );
  };
  const positive = { min: 0, minExclusive: true, max: 1e100 };
  return (
    <div className="item tube-row">
      <h3>Tube row</h3>
      <div className="row">
        <NumberField
          label="tubes"
          title={`Number of tubes (1 to ${MAX_ROW})`}
          value={count}
          onCommit={setCount}
          rule={{ min: 1, max: MAX_ROW, integer: true }}
          width="3.5em"
        />
        <NumberField
          label={`diameter (${u})`}
          title="Outer diameter of each tube"
          value={diameter}
          onCommit={setDiameter}
          rule={positive}
          width="5em"
        />
        <NumberField
          label={`pitch (${u})`}
          title="Centre to centre"
          value={pitch}
          onCommit={setPitch}
          rule={positive}
          width="5em"
        />
      </div>
      {wall ? (
        <div className="row">
          <NumberField
            label={`from the selected wall (${u})`}
            title="Distance from the wall to the tubes' centre line; the row is centred along the wall"
            value={distance}
            onCommit={setDistance}
            rule={positive}
            width="5em"
          />
        </div>
      ) : (
        <div className="row">
          <NumberField
            label={`centre x (${u})`}
            title="x of the first tube's centre"
            value={x}
            onCommit={setX}
            rule={COORDINATE_RULE}
            width="5em"
          />
          <NumberField
            label={`centre y (${u})`}
            title="y of the first tube's centre"
            value={y}
            onCommit={setY}
            rule={COORDINATE_RULE}
            width="5em"
          />
          <NumberField
            label="angle (°)"
            title="Direction of the row, degrees anticlockwise from +x"
            value={angle}
            onCommit={setAngle}
            rule={{ min: -360, max: 360 }}
            width="4em"
          />
        </div>
      )}
      <p className="hint">
        {wall
          ? 'Measured from the selected wall to the centre line, the row centred along the wall.'
          : 'Select one wall edge to place the row a distance from that wall.'}{' '}
        Each tube is an exact circle, one surface; the row stays a row (select a tube to change it).
      </p>
      <button
        type="button"
        title="Add the tube row (one undo step); each tube is its own surface, and the row can be changed as a whole"
        onClick={place}
      >
        Place tube row
      </button>
      {problem && (
        <p className="field-problem" role="alert">
          Not placed: {problem}.
        </p>
      )}
    </div>
  );
}
