import { useMemo } from 'react';
import { useApp } from '../AppContext';
import { selectDoc, selectSelection } from '../../state/selectors';
import { edgeNames } from '../../state/geometry/polygon';

/** Surface names of the selected edges and shapes. */
export function useSelectedSurfaces(): Set<string> {
  const doc = useApp(selectDoc);
  const selection = useApp(selectSelection);
  return useMemo(() => {
    const names = new Set<string>();
    for (const p of selection) {
      const shape = doc.shapes[p.shape];
      if (!shape) continue;
      const all = edgeNames(shape);
      if (p.type === 'edge') names.add(all[p.index]);
      if (p.type === 'shape') all.forEach((n) => names.add(n));
    }
    return names;
  }, [doc, selection]);
}
