// Keeps the exchange cache in step with the results pipeline: whenever the shown
// surface factors or the properties that go with them change, re-derive. The
// usual few dozen surfaces solve in this thread in microseconds; past
// LIVE_SOLVE_LIMIT surfaces the solve goes to the exchange's worker
// (background.ts), the results shown meanwhile marked stale.
import type { AppState, AppStore } from '../store';
import { shownResult, type ShownResult } from '../results/derive';
import { BackgroundExchange, type ExchangeWorker } from './background';
import { deriveExchange, exchangeKnown, fileExchange } from './derive';
import { exchangeJob } from './solveJob';

/**
 * Above this many surfaces a solve costs milliseconds to a good part of a
 * second (a dense factorization, ~n^3/3, once or per Newton step): during a
 * drag the exchange waits for the gesture to end, marked stale, instead of
 * stalling every frame, and it is solved off the page where workers exist.
 */
export const LIVE_SOLVE_LIMIT = 300;

/**
 * Start recomputing; returns the unsubscribe function. `spawn` makes the
 * exchange's worker (none: every solve in this thread, as in tests).
 */
export function startLiveExchange(store: AppStore, spawn?: () => ExchangeWorker | null): () => void {
  let lastVf: AppState['viewFactors'] | null = null;
  let deferred = false;
  const background = spawn ? new BackgroundExchange(spawn) : null;

  const show = (shown: ShownResult | null) => {
    const s = store.getState();
    const next = deriveExchange(shown);
    if (next !== s.exchange) s.setExchange(next);
  };
  const markStale = () => {
    const s = store.getState();
    if (s.exchange.kind !== 'none' && !s.exchange.stale) s.setExchange({ ...s.exchange, stale: true });
  };
  const solveElsewhere = (shown: ShownResult, bg: BackgroundExchange) => {
    markStale();
    void bg.solve(exchangeJob(shown)).then((outcome) => {
      if (outcome === 'superseded') return;
      // Filed only while these factors are still the ones shown (else a newer solve is on its way).
      if (shownResult(store.getState().viewFactors) !== shown) return;
      if (outcome !== 'failed') fileExchange(shown, { ...outcome, stale: shown.stale });
      show(shown); // 'failed': solved here instead
    });
  };

  // Read the store, not the listener's argument: the results stage updates the
  // store from inside the same notification, so an argument can be one step old.
  const update = () => {
    const s = store.getState();
    if (s.viewFactors === lastVf && !(deferred && !s.gestureBase)) return;
    const shown = shownResult(s.viewFactors);
    const large = shown !== null && shown.names.length > LIVE_SOLVE_LIMIT;
    if (s.gestureBase && large) {
      deferred = true;
      markStale();
      return;
    }
    lastVf = s.viewFactors;
    deferred = false;
    if (large && background && !exchangeKnown(shown)) solveElsewhere(shown, background);
    else show(shown);
  };
  update();
  const unsubscribe = store.subscribe(update);
  return () => {
    unsubscribe();
    background?.dispose();
  };
}
