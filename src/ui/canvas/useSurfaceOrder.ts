import { useShallow } from 'zustand/react/shallow';
import { useApp } from '../AppContext';
import { selectSurfaceOrder } from '../../state/selectors';

/**
 * Surface names in table order, as the same Map while they stay the same: a
 * drag moves points but keeps names, so the matrix table need not re-render.
 */
export function useSurfaceOrder(): ReadonlyMap<string, number> {
  return useApp(useShallow(selectSurfaceOrder));
}
