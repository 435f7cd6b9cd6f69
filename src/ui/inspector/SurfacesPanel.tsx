import { useMemo, useState } from 'react';
import { useApp, useAppStore } from '../AppContext';
import { selectDoc } from '../../state/selectors';
import { edgeLength, edgeNames } from '../../state/geometry/polygon';
import { arcLength, isCircle } from '../../state/edits/circleShapes';
import { joinSurfaces, renameSurface, splitSurfaceParts, surfaceNameProblem } from '../../state/edits/surfaceEdits';
import type { Pick } from '../../state/selection';
import type { SketchFile } from '../../state/sketchFile';
import { surfaceStyle } from '../palette';
import { TextField } from './TextField';
import { NumberField } from './NumberField';
import { fmtLength } from '../matrix/format';
import { useSelectedSurfaces } from '../canvas/useSelectedSurfaces';
import { useSurfaceColours } from '../canvas/useSurfaceColours';

interface SurfaceRow {
  name: string;
  edges: Pick[];
  length: number;
}

function surfaceRows(doc: SketchFile): SurfaceRow[] {
  const rows = new Map<string, SurfaceRow>();
  doc.shapes.forEach((shape, s) =>
    edgeNames(shape).forEach((name, k) => {
      if (!rows.has(name)) rows.set(name, { name, edges: [], length: 0 });
      const r = rows.get(name)!;
      // An arc is not picked on its own: choosing it picks its circle.
      if (!isCircle(shape)) r.edges.push({ type: 'edge', shape: s, index: k });
      else if (!r.edges.some((p) => p.type === 'shape' && p.shape === s)) r.edges.push({ type: 'shape', shape: s });
      r.length += isCircle(shape) ? arcLength(shape, k) : edgeLength(shape, k);
    }),
  );
  return [...rows.values()];
}

export function SurfacesPanel() {
  const doc = useApp(selectDoc);
  const store = useAppStore();
  const rows = useMemo(() => surfaceRows(doc), [doc]);
  const chosen = useSelectedSurfaces();
  const colours = useSurfaceColours();
  const [parts, setParts] = useState(2);
  if (!rows.length) return <p className="hint">No surfaces yet.</p>;
  const picked = rows.filter((r) => chosen.has(r.name));
  const toggle = (r: SurfaceRow, on: boolean) => {
    const s = store.getState();
    const others = s.selection.filter((p) => p.type !== 'edge' || edgeNames(doc.shapes[p.shape])[p.index] !== r.name);
    // A whole shape picked on the canvas counts as its surfaces: keep only edges of the others.
    const kept = others.filter((p) => p.type !== 'shape' || !edgeNames(doc.shapes[p.shape]).includes(r.name));
    s.setSelection(on ? [...kept, ...r.edges] : kept);
  };
  const split = (n: number) => {
    const s = store.getState();
    let next = s.doc;
    for (const r of picked) next = splitSurfaceParts(next, r.name, n) ?? next;
    s.commit(next);
    s.setSelection([]);
  };
  return (
    <div className="surfaces-panel">
      <p className="hint surface-note">
        A surface is one or more edges that share one radiosity and one temperature. A long wall whose flux varies along
        it should be split into parts; a tube splits into equal arcs, numbered anticlockwise from the +x side.
      </p>
      <ul className="surface-list" aria-label="Surfaces">
        {rows.map((r, i) => {
          const st = surfaceStyle(colours.get(r.name) ?? i);
          return (
            <li key={r.name}>
              <input
                type="checkbox"
                checked={chosen.has(r.name)}
                aria-label={`Choose surface ${r.name}`}
                title="Choose this surface (its edges are selected on the canvas)"
                onChange={(e) => toggle(r, e.target.checked)}
              />
              <span
                className={`swatch${st.dash ? ' dashed' : ''}`}
                style={{ background: st.colour, borderColor: st.colour }}
                aria-hidden="true"
              />
              <TextField
                label={`Name of surface ${i + 1}`}
                hideLabel
                title="Rename this surface (a name already in use joins the two)"
                value={r.name}
                check={surfaceNameProblem}
                onCommit={(to) => store.getState().edit((d) => renameSurface(d, r.name, to))}
              />
              <span className="meta">
                {r.edges.length} edge{r.edges.length > 1 ? 's' : ''}, {fmtLength(r.length)} {doc.units}
              </span>
            </li>
          );
        })}
      </ul>
      <div className="surface-actions" role="group" aria-label="Chosen surfaces">
        <span className="meta">
          {picked.length} chosen{picked.length ? `: ${picked.map((r) => r.name).join(', ')}` : ''}
        </span>
        <button
          type="button"
          disabled={picked.length < 2}
          title="Join the chosen surfaces into the first one (its name and properties)"
          onClick={() => {
            const s = store.getState();
            s.edit((d) =>
              joinSurfaces(
                d,
                picked.map((r) => r.name),
              ),
            );
          }}
        >
          Join
        </button>
        <button
          type="button"
          disabled={!picked.some((r) => r.edges.length > 1)}
          title="Give each edge of the chosen surfaces its own name"
          onClick={() => split(1)}
        >
          Split into edges
        </button>
        <NumberField
          label="parts"
          title="Number of equal parts each edge of the chosen surfaces is cut into (2 to 1000)"
          value={parts}
          onCommit={setParts}
          rule={{ min: 2, max: 1000, integer: true }}
          width="3.5em"
        />
        <button
          type="button"
          disabled={!picked.length}
          title="Cut every edge of the chosen surfaces into equal parts, each its own surface (a profile along the wall)"
          onClick={() => split(parts)}
        >
          Split into {parts} parts
        </button>
      </div>
    </div>
  );
}
