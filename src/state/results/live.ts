// Keeps the results cache in step with the document. Every document change is
// checked (cached per document); a view-factor job is posted only when the
// geometry key changes, so names, properties and units never cost a job.
import type { DocumentApi } from '../documentApi';
import type { SketchFile } from '../sketchFile';
import type { AppStore } from '../store';
import type { JobOutcome } from '../../worker/client';
import { jobFromPolygons, type ViewFactorJob } from '../../worker/job';
import { checkedGeometry, type CheckedGeometry } from './checked';
import { scaleBetween } from './geometry';

/** What the pipeline needs of the worker client. */
export interface JobRunner {
  run(job: ViewFactorJob): Promise<JobOutcome>;
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
  if (edges && scaleBetween(edges.basis.key, current.key) !== null) {
    setViewFactors({ status: 'ready', current, problems: [], error: null });
    return;
  }
  const waiting = pending.job;
  setViewFactors({
    status: waiting && sameKey(waiting.basis, current) ? viewFactors.status : 'computing',
    current,
    problems: [],
    error: null,
  });
  if (waiting && sameKey(waiting.basis, current)) return;
  const job: Pending = { basis: current };
  pending.job = job;
  void runner.run(jobFromPolygons(current.polygons, current.circles)).then((outcome) => {
    if (pending.job === job) pending.job = null;
    file(store, job.basis, outcome);
  });
}

function sameKey(a: CheckedGeometry, b: CheckedGeometry): boolean {
  return scaleBetween(a.key, b.key) !== null;
}

/** File a finished job with the geometry it was computed for. */
function file(store: AppStore, basis: CheckedGeometry, outcome: JobOutcome): void {
  if (outcome.kind === 'dropped') return;
  const s = store.getState();
  const current = s.viewFactors.current;
  const forCurrent = current !== null && sameKey(basis, current);
  if (outcome.kind === 'done') {
    // A draft opened while this job ran (results cleared, sketch invalid): the answer is another drawing's.
    if (!current && !s.viewFactors.edges && s.viewFactors.status === 'invalid') return;
    // Never trade factors that fit the current geometry for older ones (a drag that came back).
    const held = s.viewFactors.edges;
    if (!forCurrent && held && current && sameKey(held.basis, current)) return;
    const edges = { basis, result: outcome.result, elapsedMs: outcome.elapsedMs };
    // An older job's answer is still shown (at most one behind) while the newest one runs.
    s.setViewFactors(forCurrent ? { edges, status: 'ready' } : { edges });
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
  let last = store.getState().doc;
  refresh(store, runner, api, last, pending);
  return store.subscribe((s) => {
    if (s.doc === last) return;
    last = s.doc;
    refresh(store, runner, api, s.doc, pending);
  });
}
