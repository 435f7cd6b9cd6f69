// Runs view-factor jobs in a worker so that the newest geometry always wins:
// at most one job runs and at most one waits; a newer request replaces the
// waiting one (its caller gets 'dropped'). A job that throws, or does not answer
// within the time limit, fails, and the worker is replaced before the next job.
import type { EdgeViewFactors, ViewFactorJob } from './job';

/** One live worker. `onCrash` reports an uncaught error that killed it. */
export interface WorkerHandle {
  compute(job: ViewFactorJob): Promise<EdgeViewFactors>;
  terminate(): void;
  onCrash?(listener: (message: string) => void): void;
}

export type JobOutcome =
  | { kind: 'done'; result: EdgeViewFactors; elapsedMs: number }
  | { kind: 'dropped' }
  | { kind: 'failed'; reason: 'threw' | 'timeout' | 'crashed'; message: string };

interface Entry {
  job: ViewFactorJob;
  resolve: (o: JobOutcome) => void;
}

export interface ClientOptions {
  /** Longest a job may run before the worker is considered hung, ms. */
  timeLimitMs: number;
  now?: () => number;
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
      const entry = { job, resolve };
      if (!this.running) {
        this.launch(entry);
        return;
      }
      this.waiting?.resolve({ kind: 'dropped' });
      this.waiting = entry;
    });
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
      if (this.worker === w) this.fail('crashed', message);
    });
    return w;
  }

  private launch(entry: Entry): void {
    const now = this.options.now ?? (() => performance.now());
    const started = now();
    const timer = setTimeout(
      () => this.fail('timeout', `the view-factor worker did not answer within ${this.options.timeLimitMs / 1000} s`),
      this.options.timeLimitMs,
    );
    const current = { ...entry, started, timer };
    this.launched++;
    this.running = current;
    let answer: Promise<EdgeViewFactors>;
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

  private fail(reason: 'threw' | 'timeout' | 'crashed', message: string): void {
    const current = this.running;
    if (!current) return;
    clearTimeout(current.timer);
    this.running = null;
    // A worker that threw may hold broken state; a hung one cannot be interrupted.
    this.worker.terminate();
    this.restarts++;
    if (!this.disposed) this.worker = this.start();
    current.resolve({ kind: 'failed', reason, message });
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
