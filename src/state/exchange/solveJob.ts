// One solve of the exchange stage as plain data, so that the page or the
// exchange's worker (background.ts) can run it: the same function either way.
// Pure: numbers and the document's messages in, a view out.
import { SolverMemory } from '../../core/exchange';
import { solveSketchExchange, type SketchExchangePart } from '../../document/exchangeInput';
import type { ShownResult } from '../results/derive';
import type { ExchangeView } from './slice';

export type SolvedView = Exclude<ExchangeView, { kind: 'none' }>;

/** The factors of one solve: n x n surface view factors, row-major, row = from (dimensionless), and lengths in the part's units. */
export interface JobFactors {
  F: Float64Array;
  surfaceLength: Float64Array;
}

/** What one solve needs: the sketch's properties, the surface names and their factors. */
export interface ExchangeJob {
  /** Units, properties and settings of the geometry the factors belong to (lengths in its units). */
  part: SketchExchangePart;
  names: string[];
  /**
   * On the page, the shown answer's sums themselves: one object per answer, so its
   * identity tells one answer from another. Its F alone does not: the matrix of a
   * retired answer is refilled for a later one (results/derive.ts, retireSurfaceFactors).
   */
  factors: JobFactors;
}

/**
 * A job as posted: the factors only when the worker does not hold them yet. A
 * property edit keeps the factors, and copying surfaces^2 numbers into fresh
 * memory held the page for 50-60 ms at 1012 surfaces (Chromium, development machine).
 */
export interface ExchangeMessage {
  id: number;
  part: ExchangeJob['part'];
  names: string[];
  /** The job's factors, or null: the ones posted last to this worker. */
  factors: JobFactors | null;
}

/**
 * The worker's side (exchangeWorker.ts): keeps the last factors posted and
 * answers each message; view null when it holds none (never, as posted).
 */
export class HeldFactors {
  private factors: ExchangeMessage['factors'] = null;

  answer(message: ExchangeMessage): { id: number; view: SolvedView | null; transfer: ArrayBuffer[] } {
    const { id, part, names } = message;
    const factors = (this.factors = message.factors ?? this.factors);
    if (!factors) return { id, view: null, transfer: [] };
    const view = solveExchangeJob({ part, names, factors }, false);
    return { id, view, transfer: viewBuffers(view) };
  }
}

/** The job for what is on screen. */
export function exchangeJob(shown: ShownResult): ExchangeJob {
  return {
    part: { units: shown.units, surfaces: shown.sketch.surfaces, settings: shown.sketch.settings },
    names: [...shown.names],
    factors: shown.result,
  };
}

/**
 * Solvers and scratch kept from one solve to the next in this thread (the page's,
 * or the exchange worker's): a sketch is solved again after every edit. At 1012
 * surfaces they hold about 50 MB, and save about 8 fresh 8 MB arrays per solve.
 */
const memory = new SolverMemory();

/** Solve the job; messages instead of exceptions. `stale` is copied into the view. */
export function solveExchangeJob(job: ExchangeJob, stale: boolean): SolvedView {
  const { part, names, factors } = job;
  const outcome = solveSketchExchange(part, names, factors, undefined, memory);
  if (!outcome.ok) {
    const surface = outcome.surface === undefined ? undefined : names[outcome.surface];
    return { kind: 'error', message: outcome.message, surface, stale };
  }
  return {
    kind: 'solved',
    names,
    lengths: factors.surfaceLength,
    units: part.units,
    conditions: [...outcome.input.conditions],
    result: outcome.result,
    stale,
  };
}

/** The arrays of a solved view, to hand over instead of copy (the exchange table is surfaces^2 numbers). */
export function viewBuffers(view: SolvedView): ArrayBuffer[] {
  if (view.kind !== 'solved') return [];
  const r = view.result;
  // Not the lengths: they are the job's (in the worker, the held factors' own).
  const arrays = [
    r.radiosity,
    r.irradiation,
    r.temperature,
    r.emissivity,
    r.netFlux,
    r.netHeat,
    r.exchange,
    r.surroundingsViewFactor,
    r.surroundingsExchange,
    r.netHeatTotal,
  ];
  const buffers = new Set<ArrayBuffer>();
  for (const a of arrays) if (a && a.byteLength > 0) buffers.add(a.buffer as ArrayBuffer);
  return [...buffers];
}
