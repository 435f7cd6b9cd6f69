import { useShallow } from 'zustand/react/shallow';
import { useApp } from '../AppContext';
import type { AppState } from '../../state/store';
import { edgeNames } from '../../state/geometry/polygon';

function selectSelectedSurfaces(s: AppState): Set<string> {
  const names = new Set<string>();
  for (const p of s.selection) {
    const shape = s.doc.shapes[p.shape];
    if (!shape) continue;
    const all = edgeNames(shape);
    if (p.type === 'edge') names.add(all[p.index]);
    if (p.type === 'shape') all.forEach((n) => names.add(n));
  }
  return names;
}

/** Surface names of the selected edges and shapes; the same Set while the names stay the same (as during a drag). */
export function useSelectedSurfaces(): Set<string> {
  return useApp(useShallow(selectSelectedSurfaces));
}
