// Keeps the results cache in step with the document. Every document change is
// checked (cached per document); a view-factor job is posted only when the
// geometry key changes, so names, properties and units never cost a job. The
// exception: a sketch whose edge matrix would pass the core's budget (above 5000
// edges) is summed to surfaces in the workers, so there a rename that merges or
// splits surfaces, or a regroup, posts a job too (a plain rename does not).
import type { DocumentApi } from '../documentApi';
import type { SketchFile } from '../sketchFile';
import type { AppStore } from '../store';
import type { JobOutcome } from '../../worker/client';
import { jobFromPolygons, needsSurfaceJob, type ViewFactorAnswer, type ViewFactorJob } from '../../worker/job';
import { checkedGeometry, type CheckedGeometry } from './checked';
import { scaleBetween } from './geometry';
import { answerFitsSurfaces, retireSurfaceFactors } from './derive';
import { gestureCanCatchUp } from '../historySlice';

/** What the pipeline needs of the worker client. */
export interface JobRunner {
  run(job: ViewFactorJob): Promise<JobOutcome>;
  /** An answer nothing holds any more: its buffers go back to the workers (they are detached here). */
  recycle?(answer: ViewFactorAnswer): void;
}

/** The key of the job running or waiting, so an unchanged geometry does not post it again. */
interface Pending {
  basis: CheckedGeometry;
}

function refresh(
  store: AppStore,
  runner: JobRunner,
  api: DocumentApi,
  doc: SketchFile,
  pending: { job: Pending | null },
  retire: (answer: ViewFactorAnswer) => void,
): void {
  const { setViewFactors, viewFactors } = store.getState();
  if (doc.shapes.length === 0) {
    setViewFactors({ status: 'empty', current: null, problems: [], error: null, edges: null });
    return;
  }
  const check = api.restore(doc);
  if (!check.ok) {
    setViewFactors({ status: 'invalid', current: null, problems: check.errors, error: null });
    return;
  }
  const current = checkedGeometry(doc.shapes, check.sketch);
  const edges = viewFactors.edges;
  if (edges && fits(edges.basis, edges.result, current)) {
    setViewFactors({ status: 'ready', current, problems: [], error: null });
    return;
  }
  const waiting = pending.job;
  setViewFactors({
    status: waiting && sameJob(waiting.basis, current) ? viewFactors.status : 'computing',
    current,
    problems: [],
    error: null,
  });
  if (waiting && sameJob(waiting.basis, current)) return;
  const job: Pending = { basis: current };
  pending.job = job;
  void runner.run(jobOf(current, store.getState().gestureBase !== null)).then((outcome) => {
    if (pending.job === job) pending.job = null;
    file(store, job.basis, outcome, retire);
  });
}

function sameKey(a: CheckedGeometry, b: CheckedGeometry): boolean {
  return scaleBetween(a.key, b.key) !== null;
}

/** Surface sums are posted for sketches past the edge-matrix budget; they need the surface index. */
function summedToSurfaces(g: CheckedGeometry): boolean {
  return needsSurfaceJob(g.surfaces.edgeSurface.length);
}

/** The job for `g`; one posted during a gesture leaves a core to the page (worker/pool.ts). */
function jobOf(g: CheckedGeometry, duringGesture: boolean): ViewFactorJob {
  const surfaces = { edgeSurface: g.surfaces.edgeSurface, count: g.surfaces.names.length };
  return jobFromPolygons(g.polygons, g.circles, summedToSurfaces(g) ? surfaces : undefined, duringGesture);
}

/** The job for `a` answers for `b` too: same geometry up to scale and, for surface sums, the same surface index. */
function sameJob(a: CheckedGeometry, b: CheckedGeometry): boolean {
  if (!sameKey(a, b)) return false;
  return !summedToSurfaces(b) || sameEdgeSurfaces(a, b);
}

function sameEdgeSurfaces(a: CheckedGeometry, b: CheckedGeometry): boolean {
  const x = a.surfaces,
    y = b.surfaces;
  if (x === y) return true;
  if (x.names.length !== y.names.length || x.edgeSurface.length !== y.edgeSurface.length) return false;
  return x.edgeSurface.every((s, i) => s === y.edgeSurface[i]);
}

/** An answer computed for `basis` gives the current sketch's factors. */
function fits(basis: CheckedGeometry, result: ViewFactorAnswer, current: CheckedGeometry): boolean {
  return sameKey(basis, current) && answerFitsSurfaces(result, current.surfaces);
}

/** File a finished job with the geometry it was computed for; answers not kept, or replaced, are retired. */
function file(
  store: AppStore,
  basis: CheckedGeometry,
  outcome: JobOutcome,
  retire: (answer: ViewFactorAnswer) => void,
): void {
  if (outcome.kind === 'dropped') return;
  const s = store.getState();
  const current = s.viewFactors.current;
  const forCurrent = current !== null && sameJob(basis, current);
  if (outcome.kind === 'done') {
    // A draft opened while this job ran (results cleared, sketch invalid): the answer is another drawing's.
    if (!current && !s.viewFactors.edges && s.viewFactors.status === 'invalid') {
      retire(outcome.result);
      return;
    }
    // Never trade factors that fit the current geometry for older ones (a drag that came back).
    const held = s.viewFactors.edges;
    if (!forCurrent && held && current && fits(held.basis, held.result, current)) {
      retire(outcome.result);
      return;
    }
    const edges = { basis, result: outcome.result, elapsedMs: outcome.elapsedMs };
    // An older job's answer is still shown (at most one behind) while the newest one runs.
    s.setViewFactors(forCurrent ? { edges, status: 'ready' } : { edges });
    if (held && held.result !== outcome.result) retire(held.result);
    return;
  }
  const what = outcome.reason === 'timeout' ? 'took too long' : 'failed';
  const text = `The view-factor calculation ${what} (${outcome.message}). The worker was restarted; your sketch is unchanged.`;
  s.notify('error', text);
  if (forCurrent) s.setViewFactors({ status: 'error', error: text });
}

/** Recompute on every document change; returns the unsubscribe function. */
export function startLiveResults(store: AppStore, runner: JobRunner, api: DocumentApi): () => void {
  const pending = { job: null as Pending | null };
  // An answer that leaves the store is recycled one answer later, not at once: a
  // render already under way may still read the one it replaced.
  let retiring: ViewFactorAnswer | null = null;
  const retire = (answer: ViewFactorAnswer) => {
    if (retiring && retiring !== answer) {
      retireSurfaceFactors(retiring);
      runner.recycle?.(retiring);
    }
    retiring = answer;
  };
  let last = store.getState().doc;
  refresh(store, runner, api, last, pending, retire);
  // The state is read afresh, not taken from the listener's argument: a change made
  // inside a listener (the gesture catching up) reaches later listeners first.
  return store.subscribe(() => {
    const s = store.getState();
    // A paced drag (historySlice): the document takes the newest position once nothing is computing.
    if (gestureCanCatchUp(s)) {
      s.catchUpGesture();
      return;
    }
    if (s.doc === last) return;
    last = s.doc;
    refresh(store, runner, api, s.doc, pending, retire);
  });
}
