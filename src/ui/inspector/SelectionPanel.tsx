import { useState } from 'react';
import { useApp, useAppStore, useController } from '../AppContext';
import { selectDoc, selectSelection } from '../../state/selectors';
import { edgeEnds, edgeLength, edgeNames } from '../../state/geometry/polygon';
import { insertVertex } from '../../state/edits/shapeEdits';
import { groupEdges, surfaceNameProblem } from '../../state/edits/surfaceEdits';
import { shapeTitle } from './shapeTitle';
import { VertexRow } from './VertexRow';
import { fmtLength } from '../matrix/format';
import { ShapeCommands } from './ShapeCommands';
import { TubeRowForm } from './TubeRowForm';
import { PointsPaste } from './PointsPaste';
import { PointList } from './PointList';
import { CircleRow } from './CircleRow';

export function SelectionPanel() {
  const doc = useApp(selectDoc);
  const selection = useApp(selectSelection);
  const store = useAppStore();
  const controller = useController();
  const [groupName, setGroupName] = useState('');
  const u = doc.units;
  if (!selection.length) {
    return (
      <div className="selection-panel">
        <p className="hint">
          Nothing selected. Click a vertex, an edge or inside a shape with the Select tool (V); shift-click to add more.
        </p>
        <ShapeCommands shapes={0} />
        <TubeRowForm />
      </div>
    );
  }
  const touched = new Set(selection.map((p) => p.shape)).size;
  const edges = selection.filter((p) => p.type === 'edge');
  const vertices = selection.filter((p) => p.type === 'vertex');
  const shapes = selection.filter((p) => p.type === 'shape');
  const group = () => {
    const name = groupName.trim();
    if (!name) return;
    const why = surfaceNameProblem(name);
    if (why) {
      store.getState().notify('warning', `Not grouped: ${why}.`);
      return;
    }
    store.getState().edit((d) =>
      groupEdges(
        d,
        edges.map((e) => ({ shape: e.shape, index: e.index })),
        name,
      ),
    );
    setGroupName('');
  };
  return (
    <div className="selection-panel">
      {vertices.slice(0, 6).map((v) => {
        const shape = doc.shapes[v.shape];
        if (!shape || v.type !== 'vertex' || !shape.points[v.index]) return null;
        return (
          <div key={`v${v.shape}:${v.index}`} className="item">
            <h3>{shapeTitle(doc, v.shape)}</h3>
            <VertexRow shape={v.shape} index={v.index} point={shape.points[v.index]} units={u} />
          </div>
        );
      })}
      {edges.slice(0, 6).map((e) => {
        const shape = doc.shapes[e.shape];
        if (!shape || e.type !== 'edge' || shape.circle) return null;
        const [a, b] = edgeEnds(shape, e.index);
        return (
          <div key={`e${e.shape}:${e.index}`} className="item">
            <h3>
              {shapeTitle(doc, e.shape)}, edge {e.index + 1}
            </h3>
            <p>
              surface <strong className="name">{edgeNames(shape)[e.index]}</strong>; length{' '}
              {fmtLength(edgeLength(shape, e.index))} {u}
            </p>
            <button
              type="button"
              title="Split this edge in two at its midpoint (also: double-click the edge)"
              onClick={() =>
                store.getState().edit((d) => insertVertex(d, e.shape, e.index, [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2]))
              }
            >
              Insert vertex at midpoint
            </button>
          </div>
        );
      })}
      {edges.length > 6 && <p>…and {edges.length - 6} more edges</p>}
      {edges.length > 0 && (
        <div className="item group-box">
          <h3>
            Group {edges.length} edge{edges.length > 1 ? 's' : ''} into one surface
          </h3>
          <span className="field">
            <label htmlFor="group-name">surface name</label>
            <input
              id="group-name"
              type="text"
              value={groupName}
              maxLength={200}
              placeholder="e.g. roof"
              title="Name of the surface the selected edges will form (an existing name merges them into it)"
              onChange={(ev) => setGroupName(ev.target.value)}
              onKeyDown={(ev) => {
                if (ev.key === 'Enter') group();
              }}
            />
          </span>
          <button
            type="button"
            disabled={!groupName.trim()}
            title="Give the selected edges this surface name"
            onClick={group}
          >
            Group
          </button>
        </div>
      )}
      {shapes.slice(0, 2).map((p) => {
        const shape = doc.shapes[p.shape];
        if (!shape) return null;
        if (shape.circle)
          return (
            <div key={`s${p.shape}`} className="item">
              <h3>
                {shapeTitle(doc, p.shape)}: circle, {edgeNames(shape).length} arc
                {edgeNames(shape).length > 1 ? 's' : ''}
              </h3>
              <CircleRow shape={p.shape} circle={shape.circle} units={u} />
            </div>
          );
        return (
          <div key={`s${p.shape}`} className="item">
            <h3>
              {shapeTitle(doc, p.shape)}: {shape.points.length} points
            </h3>
            <PointList shape={p.shape} points={shape.points} units={u} />
            <PointsPaste shape={p.shape} />
          </div>
        );
      })}
      {(shapes.length > 0 || vertices.length > 0) && (
        <button
          type="button"
          className="danger"
          title="Delete the selected shapes and vertices (Delete key)"
          onClick={() => controller.deleteSelection()}
        >
          Delete selected
        </button>
      )}
      <ShapeCommands shapes={touched} />
      <TubeRowForm />
    </div>
  );
}
