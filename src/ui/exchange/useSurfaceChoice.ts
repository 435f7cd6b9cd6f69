import { useEffect, useMemo } from 'react';
import { useApp, useAppStore } from '../AppContext';
import { selectExchangeSurface } from '../../state/exchangeSelectors';
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
  useEffect(() => {
    if (selected.size === 0) return;
    const current = store.getState().exchangeSurface;
    if (current !== null && selected.has(current)) return;
    const first = names.find((n) => selected.has(n));
    if (first !== undefined) store.getState().setExchangeSurface(first);
    // Follow selection changes only; a name chosen in the panel stays until the selection changes.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [selected]);
  const current = chosen !== null && names.includes(chosen) ? chosen : (names[0] ?? null);
  return { names, current, choose: (name) => store.getState().setExchangeSurface(name) };
}
