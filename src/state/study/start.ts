// Starting a study from the page: in a worker where the browser has them (so a
// long sweep that moves a shape never freezes the page; such a sweep over several
// workers, shares.ts), and in-line, after the page has drawn, where it has none
// (tests, old browsers). Either way the caller gets progress and one final reply,
// and can stop it. A worker whose study ended is kept for the next (idleWorkers.ts).
import { runStudy, type StudyReply, type StudyRequest } from './run';
import { IdleWorkers } from './idleWorkers';
import { MAX_STUDY_WORKERS, startShares, studyWorkerCount, workerFailure } from './shares';

export interface RunningStudy {
  /** Stop now; no further reply comes. */
  stop(): void;
}

/** Workers kept between studies (idleWorkers.ts): at most one study's worth, for a minute. */
let kept: IdleWorkers | null = null;
const LINGER_MS = 60_000;

/** Start the study; `onReply` gets progress replies and then exactly one final reply (unless stopped). */
export function startStudy(request: StudyRequest, onReply: (reply: StudyReply) => void): RunningStudy {
  if (typeof Worker === 'undefined') return startInline(request, onReply);
  kept ??= new IdleWorkers(
    () => new Worker(new URL('./worker.ts', import.meta.url), { type: 'module' }),
    MAX_STUDY_WORKERS,
    LINGER_MS,
  );
  const pool = kept;
  const count = studyWorkerCount(request, navigator.hardwareConcurrency || 1);
  if (request.kind === 'sweep' && count > 1)
    return startShares(
      request,
      count,
      onReply,
      () => pool.take(),
      (w) => pool.giveBack(w),
    );
  const worker = pool.take();
  let over = false;
  worker.onmessage = (event: MessageEvent<StudyReply>) => {
    if (over) return;
    if (event.data.kind !== 'progress') {
      over = true;
      pool.giveBack(worker); // its study is over: kept, compiled, for the next
    }
    onReply(event.data);
  };
  worker.onerror = (event) => {
    if (over) return;
    over = true;
    worker.terminate();
    onReply(workerFailure({ kind: 'workerFailed', detail: event.message }));
  };
  worker.postMessage(request);
  return {
    stop: () => {
      over = true;
      worker.terminate();
    },
  };
}

function startInline(sent: StudyRequest, onReply: (reply: StudyReply) => void): RunningStudy {
  let stopped = false;
  // A copy, as a worker gets: the view factors it may carry are the pipeline's, whose
  // arrays are reused once the pipeline moves on (results/derive.ts, spares).
  const request = structuredClone(sent);
  // Let the page draw "running" before the work starts.
  const timer = setTimeout(() => {
    if (stopped) return;
    const reply = runStudy(request, (done, total) => {
      if (!stopped) onReply({ kind: 'progress', done, total });
    });
    if (!stopped) onReply(reply);
  }, 0);
  return {
    stop: () => {
      stopped = true;
      clearTimeout(timer);
    },
  };
}
