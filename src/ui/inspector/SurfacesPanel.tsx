import { useMemo } from 'react';
import { useApp, useAppStore } from '../AppContext';
import { selectDoc } from '../../state/selectors';
import { edgeLength, edgeNames } from '../../state/geometry/polygon';
import { renameSurface, splitSurface } from '../../state/edits/surfaceEdits';
import type { Pick } from '../../state/selection';
import type { SketchFile } from '../../state/sketchFile';
import { surfaceStyle } from '../palette';
import { TextField } from './TextField';
import { fmtLength } from '../matrix/format';

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
      r.edges.push({ type: 'edge', shape: s, index: k });
      r.length += edgeLength(shape, k);
    }),
  );
  return [...rows.values()];
}

export function SurfacesPanel() {
  const doc = useApp(selectDoc);
  const store = useAppStore();
  const rows = useMemo(() => surfaceRows(doc), [doc]);
  if (!rows.length) return <p className="hint">No surfaces yet.</p>;
  return (
    <ul className="surface-list" aria-label="Surfaces">
      {rows.map((r, i) => {
        const st = surfaceStyle(i);
        return (
          <li key={r.name}>
            <span
              className={`swatch${st.dash ? ' dashed' : ''}`}
              style={{ background: st.colour, borderColor: st.colour }}
              aria-hidden="true"
            />
            <TextField
              label={`Name of surface ${i + 1}`}
              hideLabel
              title="Rename this surface (a name already in use merges the two)"
              value={r.name}
              onCommit={(to) => store.getState().edit((d) => renameSurface(d, r.name, to))}
            />
            <span className="meta">
              {r.edges.length} edge{r.edges.length > 1 ? 's' : ''}, {fmtLength(r.length)} {doc.units}
            </span>
            <button
              type="button"
              title="Select this surface's edges on the canvas"
              onClick={() => store.getState().setSelection(r.edges)}
            >
              Select
            </button>
            <button
              type="button"
              disabled={r.edges.length < 2}
              title="Give each edge of this surface its own name again"
              onClick={() => store.getState().edit((d) => splitSurface(d, r.name))}
            >
              Split
            </button>
          </li>
        );
      })}
    </ul>
  );
}
