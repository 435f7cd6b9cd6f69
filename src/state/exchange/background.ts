// Solving the exchange off the page's thread for large sketches: a surface
// balance of 1000 surfaces takes about half a second (the Newton matrix is
// dense), which would hold the page after every edit. One worker, kept while
// the page lives; the newest job wins: a job still running when another comes
// is ended with its worker (a fresh one takes the new job), and its answer never shown.
// A worker left idle for a minute is ended too: it holds the factors and the
// solver memory of its last sketch (about 50 MB at 1012 surfaces, 200 MB at 2000).
import type { ExchangeJob, ExchangeMessage, JobFactors, SolvedView } from './solveJob';

/** The part of a Worker the exchange uses (a stand-in in tests). */
export interface ExchangeWorker {
  postMessage(message: ExchangeMessage): void;
  terminate(): void;
  /** view: null when the worker held no factors (never, as posted). */
  onmessage: ((event: MessageEvent<{ id: number; view: SolvedView | null }>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
}

/** The browser's exchange worker (Vite bundles it from this URL form); null without Worker. */
export function spawnExchangeWorker(): ExchangeWorker | null {
  if (typeof Worker === 'undefined') return null;
  return new Worker(new URL('./exchangeWorker.ts', import.meta.url), { type: 'module' });
}

/** A background solve's end: the view, a newer job in its place, or no answer from the worker. */
export type BackgroundOutcome = SolvedView | 'superseded' | 'failed';

/** How long an idle exchange worker is kept, ms. */
export const EXCHANGE_LINGER_MS = 60_000;

export class BackgroundExchange {
  private worker: ExchangeWorker | null = null;
  private idle: ReturnType<typeof setTimeout> | null = null;
  private running: { id: number; settle: (outcome: BackgroundOutcome) => void } | null = null;
  private nextId = 0;
  /** The factors the current worker holds: the job's factors object, compared by identity (see ExchangeJob). */
  private held: JobFactors | null = null;

  constructor(private readonly spawn: () => ExchangeWorker | null) {}

  /**
   * Solve in the worker. Resolves with the view; 'superseded' when a newer
   * job took its place; 'failed' when there is no worker or it failed (the
   * caller then solves on the page).
   */
  solve(job: ExchangeJob): Promise<BackgroundOutcome> {
    this.stopIdle();
    if (this.running) {
      // Newest wins: the running solve cannot be interrupted, so its worker goes.
      this.running.settle('superseded');
      this.end();
    }
    const worker = (this.worker ??= this.spawn());
    if (!worker) return Promise.resolve('failed');
    const id = ++this.nextId;
    return new Promise((resolve) => {
      const settle = (outcome: BackgroundOutcome) => {
        if (this.running?.id === id) {
          this.running = null;
          if (this.worker) this.idle = setTimeout(() => this.end(), EXCHANGE_LINGER_MS);
        }
        resolve(outcome);
      };
      this.running = { id, settle };
      worker.onmessage = (event) => {
        if (event.data.id === id) settle(event.data.view ?? 'failed');
      };
      worker.onerror = () => {
        this.end();
        settle('failed');
      };
      const { F, surfaceLength } = job.factors;
      const factors = this.held === job.factors ? null : { F, surfaceLength };
      this.held = job.factors;
      worker.postMessage({ id, part: job.part, names: job.names, factors });
    });
  }

  /** End the worker (and any job it runs, whose answer is then never given). */
  dispose(): void {
    this.running?.settle('superseded');
    this.end();
  }

  private stopIdle(): void {
    if (this.idle !== null) clearTimeout(this.idle);
    this.idle = null;
  }

  private end(): void {
    this.stopIdle();
    this.worker?.terminate();
    this.worker = null;
    this.running = null;
    this.held = null;
  }
}
