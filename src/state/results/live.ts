// Keeps the results cache in step with the document. Every document change is
// checked (cached per document); a view-factor job is posted only when the
// geometry key changes, so names, properties and units never cost a job. The
// exception: a sketch whose edge matrix would pass the core's budget (above 5000
// edges) is summed to surfaces in the workers, so there a rename that merges or
// splits surfaces, or a regroup, posts a job too (a plain rename does not).
// During a drag, an answer is filed no sooner than GESTURE_ANSWER_GAP_MS after its
// job was posted while a newer position waits, so the page keeps time to draw.
import type { DocumentApi } from '../documentApi';
import type { SketchFile } from '../sketchFile';
import type { AppStore } from '../store';
import type { JobOutcome } from '../../worker/client';
import { jobFromPolygons, needsSurfaceJob, type ViewFactorAnswer, type ViewFactorJob } from '../../worker/job';
import { checkedGeometry, type CheckedGeometry } from './checked';
import { scaleBetween } from './geometry';
import { answerFitsSurfaces, retireSurfaceFactors } from './derive';
import { gestureCanCatchUp, gestureIsAhead } from '../historySlice';

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

/**
 * Shortest time from posting a drag's job to filing its answer while a newer
 * position waits, ms: at most 25 answers a second, so the page keeps most of its
 * time for drawing the shape at the pointer. On the 2-core development machine a
 * 1012-edge drag drew 51-54 frames a second with it against 41-47 without, and
 * updated its table 18-19 times a second against 25-26 (DEVELOPERS.md, Performance log).
 */
export const GESTURE_ANSWER_GAP_MS = 40;

export interface LiveResultsOptions {
  /** Overrides GESTURE_ANSWER_GAP_MS (tests). */
  gestureAnswerGapMs?: number;
}

/** What the listener keeps between document changes. */
interface LiveState {
  job: Pending | null;
  gapMs: number;
  /** Answers held back by the gap, filed when their time comes (or dropped on stop). */
  held: Set<ReturnType<typeof setTimeout>>;
}

function refresh(
  store: AppStore,
  runner: JobRunner,
  api: DocumentApi,
  doc: SketchFile,
  live: LiveState,
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
  const waiting = live.job;
  setViewFactors({
    status: waiting && sameJob(waiting.basis, current) ? viewFactors.status : 'computing',
    current,
    problems: [],
    error: null,
  });
  if (waiting && sameJob(waiting.basis, current)) return;
  const job: Pending = { basis: current };
  live.job = job;
  const duringGesture = store.getState().gestureBase !== null;
  const posted = performance.now();
  void runner.run(jobOf(current, duringGesture)).then((outcome) => {
    const fileIt = () => {
      if (live.job === job) live.job = null;
      file(store, job.basis, outcome, retire);
    };
    // A drag's answer with a newer position waiting is filed no sooner than the gap after its job was posted.
    const newer = gestureIsAhead(store.getState());
    const wait = duringGesture && newer && outcome.kind === 'done' ? posted + live.gapMs - performance.now() : 0;
    if (wait <= 0) {
      fileIt();
      return;
    }
    const timer = setTimeout(() => {
      live.held.delete(timer);
      fileIt();
    }, wait);
    live.held.add(timer);
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
  const job = jobFromPolygons(g.polygons, g.circles, summedToSurfaces(g) ? surfaces : undefined);
  if (duringGesture) job.duringGesture = true;
  return job;
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
export function startLiveResults(
  store: AppStore,
  runner: JobRunner,
  api: DocumentApi,
  options: LiveResultsOptions = {},
): () => void {
  const live: LiveState = {
    job: null,
    gapMs: options.gestureAnswerGapMs ?? GESTURE_ANSWER_GAP_MS,
    held: new Set(),
  };
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
  refresh(store, runner, api, last, live, retire);
  // The state is read afresh, not taken from the listener's argument: a change made
  // inside a listener (the gesture catching up) reaches later listeners first.
  const unsubscribe = store.subscribe(() => {
    const s = store.getState();
    // A paced drag (historySlice): the document takes the newest position once nothing is computing.
    if (gestureCanCatchUp(s)) {
      s.catchUpGesture();
      return;
    }
    if (s.doc === last) return;
    last = s.doc;
    refresh(store, runner, api, s.doc, live, retire);
  });
  return () => {
    unsubscribe();
    for (const timer of live.held) clearTimeout(timer);
    live.held.clear();
  };
}
