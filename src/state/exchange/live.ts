// Keeps the exchange cache in step with the results pipeline: whenever the shown
// surface factors or the properties that go with them change, re-derive. The
// usual few dozen surfaces solve in this thread in microseconds; past
// LIVE_SOLVE_LIMIT surfaces the solve goes to the exchange's worker
// (background.ts), the results shown meanwhile marked stale.
import type { AppState, AppStore } from '../store';
import { shownResult, type ShownResult } from '../results/derive';
import { BackgroundExchange, type ExchangeWorker } from './background';
import { deriveExchange, exchangeKey, exchangeKnown, fileExchange, sameExchangeKey } from './derive';
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
  /** The key of the solve in the worker, while one runs. */
  let pending: unknown[] | null = null;
  const solveElsewhere = (shown: ShownResult, bg: BackgroundExchange) => {
    const key = exchangeKey(shown);
    if (pending && sameExchangeKey(pending, key)) return; // this very solve is on its way
    pending = key;
    markStale();
    void bg.solve(exchangeJob(shown)).then((outcome) => {
      if (outcome === 'superseded') return; // the newer job set `pending`
      pending = null;
      // Filed only while it is still what is shown (else the newer factors or properties have their own solve).
      const now = shownResult(store.getState().viewFactors);
      if (!now || !sameExchangeKey(exchangeKey(now), key)) return;
      if (outcome !== 'failed') fileExchange(now, { ...outcome, stale: now.stale });
      show(now); // 'failed': solved here instead
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
