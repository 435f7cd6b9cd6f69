// The app store, built from slices. createAppStore is a factory so tests get a
// fresh store; the app makes one in runtime.ts. A new slice joins by adding its
// type to AppState and spreading its creator below.
import { createStore, type StoreApi } from 'zustand/vanilla';
import { createDocumentSlice, type DocumentSlice } from './documentSlice';
import { createHistorySlice, type HistorySlice } from './historySlice';
import { createViewSlice, type ViewSlice } from './viewSlice';
import { createResultsSlice, type ResultsSlice } from './results/slice';
import { createExchangeSlice, type ExchangeSlice } from './exchange/slice';
import type { SketchFile } from './sketchFile';

export type AppState = DocumentSlice & HistorySlice & ViewSlice & ResultsSlice & ExchangeSlice;
export type AppStore = StoreApi<AppState>;

export function createAppStore(initial: SketchFile): AppStore {
  return createStore<AppState>()((...a) => ({
    ...createDocumentSlice(initial)(...a),
    ...createHistorySlice(...a),
    ...createViewSlice(...a),
    ...createResultsSlice(...a),
    ...createExchangeSlice(...a),
  }));
}
