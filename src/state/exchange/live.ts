// Keeps the exchange cache in step with the results pipeline: whenever the shown
// surface factors or the properties that go with them change, re-derive. The
// solve is one dense system of the named surfaces and runs in this thread:
// microseconds for the usual few dozen surfaces.
import type { AppState, AppStore } from '../store';
import { shownResult } from '../results/derive';
import { deriveExchange } from './derive';

/**
 * Above this many surfaces a solve costs milliseconds to a good part of a
 * second (dense LU, ~n^3/3), so during a drag the exchange waits for the
 * gesture to end, marked stale, instead of stalling every frame.
 */
export const LIVE_SOLVE_LIMIT = 300;

/** Start recomputing; returns the unsubscribe function. */
export function startLiveExchange(store: AppStore): () => void {
  let lastVf: AppState['viewFactors'] | null = null;
  let deferred = false;
  // Read the store, not the listener's argument: the results stage updates the
  // store from inside the same notification, so an argument can be one step old.
  const update = () => {
    const s = store.getState();
    if (s.viewFactors === lastVf && !(deferred && !s.gestureBase)) return;
    const shown = shownResult(s.viewFactors);
    if (s.gestureBase && shown && shown.names.length > LIVE_SOLVE_LIMIT) {
      deferred = true;
      if (s.exchange.kind !== 'none' && !s.exchange.stale) s.setExchange({ ...s.exchange, stale: true });
      return;
    }
    lastVf = s.viewFactors;
    deferred = false;
    const next = deriveExchange(shown);
    if (next !== s.exchange) s.setExchange(next);
  };
  update();
  return store.subscribe(update);
}
