// A pool of workers that looks like one worker to the client: each job's rows are
// split over the workers by balanced pair counts (core balancedRowSets), every
// worker computes its rows, and the main thread puts the answers together
// (assemble.ts). A part that fails fails the whole job; the client then ends the
// pool (terminate: every worker, so no part of a dropped job keeps running) and
// starts a fresh one.
import { balancedRowSets } from '../core/pairRows';
import { allRows } from '../core/viewFactors';
import { assembleAnswer } from './assemble';
import { MAX_KEPT_PAIRS } from './rowMemory';
import type { WorkerHandle } from './client';
import { isSurfaceAnswer, jobEdgeCount, type RowsAnswer, type ViewFactorAnswer, type ViewFactorJob } from './job';

/** One worker of a pool: computes some rows of a job. */
export interface RowWorker {
  computeRows(job: ViewFactorJob, rows: Int32Array): Promise<RowsAnswer>;
  /** Hand packed-row buffers back to this worker (see rowMemory.ts). */
  recycle?(buffers: Float64Array[]): void;
  terminate(): void;
  onCrash?(listener: (message: string) => void): void;
}

/**
 * Fewest pairs worth a worker of their own (about a millisecond of work): smaller
 * jobs use fewer workers, since each part costs a message and a setup.
 */
export const MIN_PAIRS_PER_WORKER = 4096;

/** Most workers in a pool, whatever the machine reports (each holds its own copy of the sketch). */
export const MAX_POOL_SIZE = 16;

/** Workers for a machine reporting `cores` logical cores: at least 1, at most MAX_POOL_SIZE. */
export function poolSize(cores: number | undefined): number {
  const c = Number.isFinite(cores) ? Math.floor(cores!) : 1;
  return Math.min(MAX_POOL_SIZE, Math.max(1, c));
}

/**
 * How many of `available` workers one job of `edgeCount` edges uses. A job posted
 * during a gesture leaves one worker idle when there are two or more: the page
 * needs a core of its own to draw the shape at the pointer and file the answers.
 * On the 2-core machine a drag of a 1012-edge sketch on one worker gave as many
 * table updates a second as on two, and 1.3-1.7 times the frames (DEVELOPERS.md, Performance log). Not
 * past MAX_KEPT_PAIRS pairs (about 4100 edges): one worker could not keep such a
 * job's rows, so each drag step would be computed whole.
 */
export function workersForJob(
  edgeCount: number,
  available: number,
  minPairs = MIN_PAIRS_PER_WORKER,
  duringGesture = false,
): number {
  const pairs = (edgeCount * (edgeCount + 1)) / 2;
  const usable = duringGesture && available > 1 && pairs <= MAX_KEPT_PAIRS ? available - 1 : available;
  return Math.max(1, Math.min(usable, edgeCount, Math.floor(pairs / minPairs)));
}

/**
 * Most pairs of a job computed on the page itself (about 180 edges). Surface sums
 * never are. Within it, a job runs on the page only when the last job of the same
 * shapes took at most PAGE_BUDGET_MS on one thread (see poolHandle).
 */
export const PAGE_MAX_PAIRS = 16384;

/**
 * Longest the last job of the same shapes may have taken, ms summed over its
 * threads, for the next one to run on the page: a few ms, well inside a frame;
 * below it the round trip to the workers (messages, waking their threads,
 * putting the parts together) costs more than the job. A few exact circles that
 * see one another past others can cost tens of ms however few their edges.
 */
export const PAGE_BUDGET_MS = 8;

/** True when `job` is small enough to compute on the page, if it is also cheap enough (PAGE_BUDGET_MS). */
export function runsOnPage(job: ViewFactorJob): boolean {
  if (job.surfaces) return false;
  const n = jobEdgeCount(job);
  return (n * (n + 1)) / 2 <= PAGE_MAX_PAIRS;
}

/** The shapes of a job as far as its cost goes: a drag keeps them, adding a point or a shape does not. */
function shapesOf(job: ViewFactorJob): string {
  return `${job.polygons.map((p) => p.points.length >> 1).join(',')};${(job.circles ?? []).map((c) => c.arcs).join(',')}`;
}

/**
 * The pool as one `WorkerHandle`. `workers` are started by the caller and ended by
 * `terminate`. `minPairsPerWorker` (tests) overrides MIN_PAIRS_PER_WORKER. `page`,
 * when given, computes all rows of a job `runsOnPage` accepts whose shapes' last
 * job took at most PAGE_BUDGET_MS: the first job of new shapes always goes to the
 * workers, and a page job over the budget sends the next one back to them.
 */
export function poolHandle(
  workers: readonly RowWorker[],
  minPairsPerWorker = MIN_PAIRS_PER_WORKER,
  page?: RowWorker,
): WorkerHandle {
  if (workers.length === 0) throw new Error('a worker pool needs at least one worker');
  // Answers the page computed: their buffers go back to the page's memory.
  const fromPage = new WeakSet<ViewFactorAnswer>();
  // What the last job cost one thread, ms (unknown: Infinity), and its shapes.
  let last = { shapes: '', ms: Infinity };
  return {
    async compute(job: ViewFactorJob): Promise<ViewFactorAnswer> {
      const n = jobEdgeCount(job);
      const shapes = shapesOf(job);
      const cheap = last.shapes === shapes && last.ms <= PAGE_BUDGET_MS;
      const onPage = page !== undefined && cheap && runsOnPage(job);
      const parts = onPage
        ? [await page.computeRows(job, allRows(n))]
        : await Promise.all(
            balancedRowSets(n, workersForJob(n, workers.length, minPairsPerWorker, job.duringGesture)).map((rows, k) =>
              workers[k].computeRows(job, rows),
            ),
          );
      // Each part reports what its rows cost its thread (a worker's API times them).
      last = { shapes, ms: parts.reduce((sum, p) => sum + (p.elapsedMs ?? Infinity), 0) };
      const answer = assembleAnswer(job, n, parts);
      if (onPage) fromPage.add(answer);
      return answer;
    },
    // Part k of an answer came from worker k (the row sets are dealt in that order).
    recycle(answer: ViewFactorAnswer) {
      if (isSurfaceAnswer(answer)) return;
      if (fromPage.has(answer)) {
        page?.recycle?.(answer.rows.packed.filter((packed) => packed.length > 0));
        return;
      }
      answer.rows.packed.forEach((packed, k) => {
        if (k < workers.length && packed.length > 0) workers[k].recycle?.([packed]);
      });
    },
    terminate() {
      for (const w of workers) w.terminate();
    },
    onCrash(listener) {
      for (const w of workers) w.onCrash?.(listener);
    },
  };
}
