import { useShallow } from 'zustand/react/shallow';
import { useApp } from '../AppContext';
import type { AppState } from '../../state/store';
import { surfaceColours } from '../../state/edits/surfaceColours';

const selectColours = (s: AppState) => surfaceColours(s.doc.shapes);

/** Surface name to colour slot (the same Map while names and edges stay), for the canvas, panels and tables. */
export function useSurfaceColours(): ReadonlyMap<string, number> {
  return useApp(useShallow(selectColours));
}
