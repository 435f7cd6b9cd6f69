// Runs view-factor jobs in a worker so that the newest geometry always wins:
// at most one job runs and at most one waits; a newer request replaces the
// waiting one (its caller gets 'dropped'). A job that throws, or does not answer
// within the time limit, fails, and the worker is replaced before the next job.
// A worker that crashes or hangs is replaced and the job tried once more on the
// new one (unless a newer job is waiting, which replaces it); a job that throws
// is not retried (the same input would throw again).
import { jobEdgeCount, jobTimeScale, type ViewFactorAnswer, type ViewFactorJob } from './job';

/** One live worker. `onCrash` reports an uncaught error that killed it. */
export interface WorkerHandle {
  compute(job: ViewFactorJob): Promise<ViewFactorAnswer>;
  /** An answer the page no longer holds: its buffers may fill later answers (they are detached here). */
  recycle?(answer: ViewFactorAnswer): void;
  terminate(): void;
  onCrash?(listener: (message: string) => void): void;
}

export type JobOutcome =
  | { kind: 'done'; result: ViewFactorAnswer; elapsedMs: number }
  | { kind: 'dropped' }
  | { kind: 'failed'; reason: 'threw' | 'timeout' | 'crashed'; message: string };

export type FailReason = 'threw' | 'timeout' | 'crashed';

/**
 * A running job of at least this many edges (tens of seconds to minutes of work)
 * is cancelled when a newer one arrives: its workers are ended and fresh ones take
 * the newer job. Smaller jobs finish, so a drag still shows results one step behind.
 */
export const CANCEL_RUNNING_FROM_EDGES = 5000;

interface Entry {
  job: ViewFactorJob;
  resolve: (o: JobOutcome) => void;
  /** 1 on the first try, 2 on the retry after a crash or a hang. */
  attempt: number;
}

/** A worker was replaced after a failure; `retrying` says whether its job runs again on the new one. */
export interface RestartEvent {
  reason: FailReason;
  message: string;
  retrying: boolean;
}

export interface ClientOptions {
  /** Longest a job of up to 2000 edges may run before the worker is considered hung, ms (scaled up for bigger jobs). */
  timeLimitMs: number;
  now?: () => number;
  /** Told each time a worker is replaced (so the page can say so). */
  onRestart?: (event: RestartEvent) => void;
}

export class ViewFactorClient {
  private worker: WorkerHandle;
  private running: (Entry & { started: number; timer: ReturnType<typeof setTimeout> }) | null = null;
  private waiting: Entry | null = null;
  private disposed = false;
  /** How many times the worker was replaced after a failure. */
  restarts = 0;
  /** How many jobs were handed to a worker (benchmarks and tests count them). */
  launched = 0;

  constructor(
    private readonly spawn: () => WorkerHandle,
    private readonly options: ClientOptions,
  ) {
    this.worker = this.start();
  }

  run(job: ViewFactorJob): Promise<JobOutcome> {
    return new Promise((resolve) => {
      if (this.disposed) {
        resolve({ kind: 'dropped' });
        return;
      }
      const entry = { job, resolve, attempt: 1 };
      if (!this.running) {
        this.launch(entry);
        return;
      }
      this.waiting?.resolve({ kind: 'dropped' });
      this.waiting = entry;
      if (jobEdgeCount(this.running.job) >= CANCEL_RUNNING_FROM_EDGES) this.cancelRunning();
    });
  }

  /** Drop the running job and end its workers (every worker of a pool); the waiting job starts on fresh ones. */
  private cancelRunning(): void {
    const current = this.running;
    if (!current) return;
    clearTimeout(current.timer);
    this.running = null;
    this.worker.terminate();
    this.worker = this.start();
    current.resolve({ kind: 'dropped' });
    this.next();
  }

  /**
   * Hand back the buffers of an answer nothing holds any more (the caller's promise:
   * they are detached from it here), so the workers need not allocate new ones.
   */
  recycle(answer: ViewFactorAnswer): void {
    if (!this.disposed) this.worker.recycle?.(answer);
  }

  /** True while a job runs or waits. */
  get busy(): boolean {
    return this.running !== null || this.waiting !== null;
  }

  dispose(): void {
    this.disposed = true;
    if (this.running) {
      clearTimeout(this.running.timer);
      this.running.resolve({ kind: 'dropped' });
    }
    this.waiting?.resolve({ kind: 'dropped' });
    this.running = this.waiting = null;
    this.worker.terminate();
  }

  private start(): WorkerHandle {
    const w = this.spawn();
    w.onCrash?.((message) => {
      if (this.worker !== w) return;
      if (this.running) this.fail('crashed', message);
      else this.replace({ reason: 'crashed', message, retrying: false }); // died idle: never hand it a job
    });
    return w;
  }

  private replace(event: RestartEvent): void {
    this.worker.terminate();
    this.restarts++;
    if (!this.disposed) this.worker = this.start();
    this.options.onRestart?.(event);
  }

  private launch(entry: Entry): void {
    const now = this.options.now ?? (() => performance.now());
    const started = now();
    // Big jobs get longer (jobTimeScale): the limit is there to catch a hang, not a big sketch.
    const limitMs = this.options.timeLimitMs * jobTimeScale(entry.job);
    const timer = setTimeout(
      () => this.fail('timeout', `the view-factor worker did not answer within ${limitMs / 1000} s`),
      limitMs,
    );
    const current = { ...entry, started, timer };
    this.launched++;
    this.running = current;
    let answer: Promise<ViewFactorAnswer>;
    try {
      answer = Promise.resolve(this.worker.compute(entry.job));
    } catch (e) {
      answer = Promise.reject(e instanceof Error ? e : new Error(errorText(e)));
    }
    answer.then(
      (result) => {
        if (this.running !== current) return; // already failed by time limit or crash
        clearTimeout(timer);
        this.running = null;
        current.resolve({ kind: 'done', result, elapsedMs: now() - started });
        this.next();
      },
      (err: unknown) => {
        if (this.running !== current) return;
        this.fail('threw', errorText(err));
      },
    );
  }

  private fail(reason: FailReason, message: string): void {
    const current = this.running;
    if (!current) return;
    clearTimeout(current.timer);
    this.running = null;
    // A crash or a hang may be the worker's, not the job's: try once more on a
    // fresh worker, unless a newer job waits (it replaces this one anyway).
    const retry = reason !== 'threw' && current.attempt === 1 && !this.waiting && !this.disposed;
    // A worker that threw may hold broken state; a hung one cannot be interrupted.
    this.replace({ reason, message, retrying: retry });
    if (retry) {
      this.launch({ job: current.job, resolve: current.resolve, attempt: 2 });
      return;
    }
    if (reason !== 'threw' && current.attempt === 1 && this.waiting) current.resolve({ kind: 'dropped' });
    else {
      const again = current.attempt > 1 ? '; it failed again on a fresh worker' : '';
      current.resolve({ kind: 'failed', reason, message: `${message}${again}` });
    }
    this.next();
  }

  private next(): void {
    const w = this.waiting;
    this.waiting = null;
    if (w && !this.disposed) this.launch(w);
  }
}

function errorText(err: unknown): string {
  if (err instanceof Error) return err.message;
  return typeof err === 'string' ? err : 'unknown error in the view-factor worker';
}
