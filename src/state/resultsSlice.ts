// Results are a cache derived from the document, never saved and never undone.
// `shown` is the newest result that finished, with the document it belongs to;
// comparing that document with the current one tells whether it is stale.
// The heat-exchange cache (exchangeSlice.ts) is derived from this one.
import type { StateCreator } from 'zustand';
import type { ViewFactorResult } from '../core/scene';
import type { SketchFile } from './sketchFile';
import type { AppState } from './store';

export type ResultStatus =
  | 'empty' // nothing to compute (no shapes)
  | 'computing' // a job for the current document is queued or running
  | 'ready' // `shown` belongs to the current document
  | 'invalid' // the current document fails validation; `shown` is for the last valid one
  | 'error'; // the worker failed on the current document

export interface ShownResult {
  doc: SketchFile;
  surfaceNames: string[];
  result: ViewFactorResult;
  /** Wall-clock time of the job, ms. */
  elapsedMs: number;
}

export interface ViewFactorCache {
  status: ResultStatus;
  shown: ShownResult | null;
  /** Validation messages for the current document. */
  problems: string[];
  /** Worker failure for the current document. */
  error: string | null;
}

export interface ResultsSlice {
  viewFactors: ViewFactorCache;
  setViewFactors: (patch: Partial<ViewFactorCache>) => void;
}

export const createResultsSlice: StateCreator<AppState, [], [], ResultsSlice> = (set) => ({
  viewFactors: { status: 'empty', shown: null, problems: [], error: null },
  setViewFactors: (patch) => set((s) => ({ viewFactors: { ...s.viewFactors, ...patch } })),
});
