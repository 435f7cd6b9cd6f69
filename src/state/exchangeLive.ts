// Keeps the exchange cache in step with the view-factor cache and the document:
// recompute when the shown view factors, or the properties and settings that go
// with them, change. The solve is one dense system of the named surfaces and
// runs in this thread: microseconds for the usual few dozen surfaces.
import type { AppState, AppStore } from './store';
import { deriveExchange, propertySource } from './exchangeDerive';

/**
 * Above this many surfaces a solve costs milliseconds to a good part of a
 * second (dense LU, ~n^3/3), so during a drag the exchange waits for the
 * gesture to end, marked stale, instead of stalling every frame.
 */
export const LIVE_SOLVE_LIMIT = 300;

/** Start recomputing; returns the unsubscribe function. */
export function startLiveExchange(store: AppStore): () => void {
  let key: unknown[] = [];
  const update = (s: AppState) => {
    const shown = s.viewFactors.shown;
    const source = shown ? propertySource(shown, s.doc) : null;
    // The stale flag changes with the document even when nothing else does.
    const next = [shown, source?.surfaces, source?.settings, source === s.doc];
    if (next.length === key.length && next.every((v, i) => v === key[i])) return;
    if (s.gestureBase && shown && shown.surfaceNames.length > LIVE_SOLVE_LIMIT) {
      if (s.exchange.kind !== 'none' && !s.exchange.stale) s.setExchange({ ...s.exchange, stale: true });
      return;
    }
    key = next;
    s.setExchange(deriveExchange(shown, s.doc));
  };
  update(store.getState());
  return store.subscribe(update);
}
