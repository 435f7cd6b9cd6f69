// Keeps the results cache in step with the document: validate, build the scene,
// ask the worker, and file the answer with the document it belongs to.
import type { DocumentApi } from './documentApi';
import type { SketchFile } from './sketchFile';
import type { AppStore } from './store';
import type { JobOutcome } from '../worker/client';
import type { ViewFactorJob } from '../worker/job';
import { jobFromScene } from '../worker/job';

/** What the pipeline needs of the worker client. */
export interface JobRunner { run(job: ViewFactorJob): Promise<JobOutcome> }

export function refreshResults(store: AppStore, runner: JobRunner, api: DocumentApi, doc: SketchFile): Promise<void> {
  const { setViewFactors } = store.getState();
  if (doc.shapes.length === 0) {
    setViewFactors({ status: 'empty', problems: [], error: null, shown: null });
    return Promise.resolve();
  }
  const check = api.restore(doc);
  if (!check.ok) {
    setViewFactors({ status: 'invalid', problems: check.errors, error: null });
    return Promise.resolve();
  }
  const { scene, surfaceNames } = api.toScene(check.sketch);
  setViewFactors({ status: 'computing', problems: [], error: null });
  return runner.run(jobFromScene(scene)).then((outcome) => {
    const current = store.getState().doc === doc;
    if (outcome.kind === 'dropped') return;
    if (outcome.kind === 'done') {
      const shown = { doc, surfaceNames, result: outcome.result, elapsedMs: outcome.elapsedMs };
      // An older job's answer is still shown (at most one behind) while the newest one runs.
      store.getState().setViewFactors(current ? { shown, status: 'ready' } : { shown });
      return;
    }
    const what = outcome.reason === 'timeout' ? 'took too long' : 'failed';
    const text = `The view-factor calculation ${what} (${outcome.message}). The worker was restarted; your sketch is unchanged.`;
    store.getState().notify('error', text);
    if (current) store.getState().setViewFactors({ status: 'error', error: text });
  });
}

/** Recompute on every document change; returns the unsubscribe function. */
export function startLiveResults(store: AppStore, runner: JobRunner, api: DocumentApi): () => void {
  let last = store.getState().doc;
  void refreshResults(store, runner, api, last);
  return store.subscribe((s) => {
    if (s.doc === last) return;
    last = s.doc;
    void refreshResults(store, runner, api, s.doc);
  });
}
