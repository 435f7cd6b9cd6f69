import { useShallow } from 'zustand/react/shallow';
import { useApp } from '../AppContext';
import type { AppState } from '../../state/store';
import { surfaceOrder } from './surfaceIndex';

// Per shapes array, so store updates that leave the shapes alone (hover, camera) cost a lookup.
const cache = new WeakMap<AppState['doc']['shapes'], Map<string, number>>();

function selectSurfaceOrder(s: AppState): Map<string, number> {
  let order = cache.get(s.doc.shapes);
  if (!order) cache.set(s.doc.shapes, (order = surfaceOrder(s.doc)));
  return order;
}

/**
 * Surface names in table order, as the same Map while they stay the same: a
 * drag moves points but keeps names, so the matrix table need not re-render.
 */
export function useSurfaceOrder(): Map<string, number> {
  return useApp(useShallow(selectSurfaceOrder));
}
