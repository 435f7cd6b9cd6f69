// The results cache: derived from the document, never saved, never undone.
// It holds only what cannot be derived on the spot: the verdict on the current
// document, and the one costly stage, edge view factors from the worker, with
// the checked geometry they were computed for. Everything after that (surface
// sums, residuals, heat exchange, tables) is derived from these by the pure,
// cached stages in derive.ts.
import type { StateCreator } from 'zustand';
import type { RestoreOutcome } from '../documentApi';
import type { ViewFactorAnswer } from '../../worker/job';
import type { AppState } from '../store';
import type { CheckedGeometry } from './checked';

export type ResultStatus =
  | 'empty' // nothing to compute (no shapes)
  | 'computing' // a job for the current geometry is queued or running
  | 'ready' // the edge factors belong to the current geometry
  | 'invalid' // the current document fails validation; the factors are for the last valid one
  | 'error'; // the worker failed on the current geometry

/** Validation problems of the current document, as `restore` reports them. */
export type Problems = Extract<RestoreOutcome, { ok: false }>['errors'];

/** The worker's answer, filed with the geometry it was computed for. */
export interface EdgeStage {
  basis: CheckedGeometry;
  result: ViewFactorAnswer;
  /** Wall-clock time of the job, ms. */
  elapsedMs: number;
}

export interface ViewFactorCache {
  status: ResultStatus;
  /** The current document's checked geometry; null while it is empty or invalid. */
  current: CheckedGeometry | null;
  /** Newest finished edge factors (for the current geometry when status is 'ready'). */
  edges: EdgeStage | null;
  problems: Problems;
  /** Worker failure for the current geometry. */
  error: string | null;
}

export interface ResultsSlice {
  viewFactors: ViewFactorCache;
  setViewFactors: (patch: Partial<ViewFactorCache>) => void;
}

export const createResultsSlice: StateCreator<AppState, [], [], ResultsSlice> = (set) => ({
  viewFactors: { status: 'empty', current: null, edges: null, problems: [], error: null },
  setViewFactors: (patch) => set((s) => ({ viewFactors: { ...s.viewFactors, ...patch } })),
});
