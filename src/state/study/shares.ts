// A sweep that moves a shape or a tube row computes view factors for every case,
// so its cases are shared over several workers (case k to share k % n), and the
// shares are put back together here: the same table, CSV and first failure as one
// worker's sweep, number for number (each case is solved exactly as in the whole).
import { parseParameter, studyFaultMessage, sweepCsv, type StudyFault } from '../../document/study';
import type { StudyReply, StudyRequest, SweepShareTable } from './run';

type SweepRequest = Extract<StudyRequest, { kind: 'sweep' }>;

/** Most workers one study takes. */
export const MAX_STUDY_WORKERS = 8;

/** Fewest cases a share takes: a new worker runs its first cases unoptimised (about two cases' time). */
const LEAST_CASES_PER_SHARE = 4;

/**
 * Workers for a study on a machine of `cores` logical cores: a sweep whose every
 * case computes view factors (a moved shape, a tube row) takes one per core but
 * the page's, with at least LEAST_CASES_PER_SHARE cases each; any other study one
 * (its factors are computed once).
 */
export function studyWorkerCount(request: StudyRequest, cores: number): number {
  if (request.kind !== 'sweep') return 1;
  const p = parseParameter(request.address);
  if (!p.ok || (p.value.kind !== 'shape' && p.value.kind !== 'row')) return 1;
  const byCases = Math.floor(request.steps / LEAST_CASES_PER_SHARE);
  return Math.max(1, Math.min(MAX_STUDY_WORKERS, Math.floor(cores) - 1, byCases));
}

/** The reply of a study that broke down inside (worded in document/study/faults.ts). */
export function workerFailure(fault: StudyFault): StudyReply {
  return { kind: 'failed', message: studyFaultMessage(fault) };
}

/**
 * The whole sweep from its shares' final replies (any order): the table, or the
 * message of the lowest case that could not be solved, as the whole sweep would stop there.
 */
export function joinShares(request: SweepRequest, finals: readonly StudyReply[]): StudyReply {
  let failure: { message: string; index: number } | null = null;
  const tables: SweepShareTable[] = [];
  for (const reply of finals) {
    if (reply.kind === 'failed') {
      const index = reply.index ?? -1;
      if (failure === null || index < failure.index) failure = { message: reply.message, index };
    } else if (reply.kind === 'sweepShare') tables.push(reply.table);
    else return workerFailure({ kind: 'unexpectedReply', reply: reply.kind });
  }
  if (failure) return { kind: 'failed', message: failure.message };
  const parsed = parseParameter(request.address);
  if (!parsed.ok || tables.length === 0) return workerFailure({ kind: 'noShare' });
  const { label, unit, names, values } = tables[0];
  const netHeat: number[][] = new Array<number[]>(values.length);
  const temperature: number[][] = new Array<number[]>(values.length);
  for (const t of tables)
    t.indices.forEach((k, q) => {
      netHeat[k] = t.netHeat[q];
      temperature[k] = t.temperature[q];
    });
  for (let k = 0; k < values.length; k++) if (!netHeat[k]) return workerFailure({ kind: 'missingCase', index: k });
  const rows = values.map((value, k) => ({
    value,
    names,
    result: { netHeat: netHeat[k], temperature: temperature[k] },
  }));
  const csv = sweepCsv(parsed.value, request.sketch.units, rows);
  return { kind: 'sweep', table: { label, unit, names, values, netHeat, temperature, csv } };
}

/** What the shares need of a worker (a browser Worker has it). */
export interface StudyWorker {
  postMessage(request: StudyRequest): void;
  onmessage: ((event: MessageEvent<StudyReply>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
  terminate(): void;
}

/**
 * Run a sweep as `count` shares, one worker each (`makeWorker`): progress is the
 * cases done over all shares; one final reply once every share has answered, or
 * as soon as a case could not be solved and no share can still refuse a lower one
 * (share q's next case is q + done * count), as one worker's sweep stops there.
 * Then each worker that has answered goes to `giveBack` (kept for the next study)
 * and any still working is ended.
 */
export function startShares(
  request: SweepRequest,
  count: number,
  onReply: (reply: StudyReply) => void,
  makeWorker: () => StudyWorker,
  giveBack: (worker: StudyWorker) => void = (worker) => worker.terminate(),
): { stop(): void } {
  const workers = Array.from({ length: count }, makeWorker);
  const done = new Array<number>(count).fill(0);
  const answered = new Array<boolean>(count).fill(false);
  const finals: StudyReply[] = [];
  let lowestRefused = Infinity;
  let over = false;
  const stop = () => {
    over = true;
    for (const w of workers) w.terminate();
  };
  // Without a refusal, every share must answer; with one, every share must be past it.
  const settle = () => {
    if (!answered.every((a, q) => a || q + done[q] * count > lowestRefused)) return;
    over = true;
    workers.forEach((worker, q) => (answered[q] ? giveBack(worker) : worker.terminate()));
    onReply(joinShares(request, finals));
  };
  workers.forEach((worker, part) => {
    worker.onmessage = (event) => {
      if (over) return;
      const reply = event.data;
      if (reply.kind === 'progress') {
        done[part] = reply.done;
        onReply({ kind: 'progress', done: done.reduce((a, b) => a + b, 0), total: request.steps });
        settle();
        return;
      }
      finals.push(reply);
      answered[part] = true;
      if (reply.kind === 'failed') lowestRefused = Math.min(lowestRefused, reply.index ?? -1);
      settle();
    };
    worker.onerror = (event) => {
      if (over) return;
      stop();
      onReply(workerFailure({ kind: 'workerFailed', detail: event.message }));
    };
    worker.postMessage({ ...request, share: { part, of: count } });
  });
  return { stop };
}
