import { useEffect, useMemo, useRef } from 'react';
import { useApp, useAppStore } from '../AppContext';
import { selectExchangeSurface } from '../../state/exchange/selectors';
import { useSurfaceOrder } from '../canvas/useSurfaceOrder';
import { useSelectedSurfaces } from '../canvas/useSelectedSurfaces';

/**
 * Surface names of the document in table order, and the one the properties
 * panel edits: the one chosen in the panel, following the canvas selection when
 * it changes, else the first surface.
 */
export function useSurfaceChoice(): { names: string[]; current: string | null; choose: (name: string) => void } {
  const chosen = useApp(selectExchangeSurface);
  const store = useAppStore();
  const selected = useSelectedSurfaces();
  const order = useSurfaceOrder();
  const names = useMemo(() => [...order.keys()], [order]);
  // Follow selection changes only: a name chosen in the panel stays until the
  // selection changes, even when the names change. The effect below reads the
  // latest names through this ref (updated first, effects run in order).
  const latestNames = useRef(names);
  useEffect(() => {
    latestNames.current = names;
  }, [names]);
  useEffect(() => {
    if (selected.size === 0) return;
    const current = store.getState().exchangeSurface;
    if (current !== null && selected.has(current)) return;
    const first = latestNames.current.find((n) => selected.has(n));
    if (first !== undefined) store.getState().setExchangeSurface(first);
  }, [selected, store]);
  const current = chosen !== null && names.includes(chosen) ? chosen : (names[0] ?? null);
  return { names, current, choose: (name) => store.getState().setExchangeSurface(name) };
}
