// Keeps the exchange cache in step with the view-factor cache and the document:
// recompute when the shown view factors, or the properties and settings that go
// with them, change. The solve is small (one dense system of the named
// surfaces) and runs in this thread.
import type { AppState, AppStore } from './store';
import { deriveExchange, propertySource } from './exchangeDerive';

/** Start recomputing; returns the unsubscribe function. */
export function startLiveExchange(store: AppStore): () => void {
  let key: unknown[] = [];
  const update = (s: AppState) => {
    const shown = s.viewFactors.shown;
    const source = shown ? propertySource(shown, s.doc) : null;
    // The stale flag changes with the document even when nothing else does.
    const next = [shown, source?.surfaces, source?.settings, source === s.doc];
    if (next.length === key.length && next.every((v, i) => v === key[i])) return;
    key = next;
    s.setExchange(deriveExchange(shown, s.doc));
  };
  update(store.getState());
  return store.subscribe(update);
}
