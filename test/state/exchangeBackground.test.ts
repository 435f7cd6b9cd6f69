// Large sketches solve their exchange in the exchange's worker (a stand-in
// here, fed structured clones as a real worker is): the page shows the last
// answer as stale meanwhile, only the newest job's answer is shown, and a
// failed worker leaves the solve to the page. The numbers are those of the
// page's own solve, bit for bit (the same function runs in both places).
import { describe, expect, it, vi } from 'vitest';
import { createAppStore, type AppStore } from '../../src/state/store';
import { startLiveResults } from '../../src/state/results/live';
import { LIVE_SOLVE_LIMIT, startLiveExchange } from '../../src/state/exchange/live';
import { EXCHANGE_LINGER_MS, type ExchangeWorker } from '../../src/state/exchange/background';
import { HeldFactors, type ExchangeMessage, type SolvedView } from '../../src/state/exchange/solveJob';
import { setCondition } from '../../src/state/exchange/edits';
import { setVertex } from '../../src/state/edits/shapeEdits';
import { shownResult } from '../../src/state/results/derive';
import { documentApi } from '../../src/state/documentApi';
import type { SketchFile } from '../../src/state/sketchFile';
import { flush, inThread, live, ring, solved } from './exchangeHelpers';

class StandInWorker implements ExchangeWorker {
  onmessage: ExchangeWorker['onmessage'] = null;
  onerror: ExchangeWorker['onerror'] = null;
  terminated = false;
  readonly posted: ExchangeMessage[] = [];
  /** The worker's own side, as exchangeWorker.ts runs it. */
  private readonly held = new HeldFactors();
  postMessage(message: ExchangeMessage): void {
    this.posted.push(structuredClone(message));
  }
  terminate(): void {
    this.terminated = true;
  }
  /** Answer the oldest job posted, as worker.ts does. */
  answer(): void {
    const m = this.posted.shift();
    if (!m) throw new Error('no job posted');
    const { id, view } = this.held.answer(m);
    this.onmessage?.({ data: structuredClone({ id, view }) } as MessageEvent<{ id: number; view: SolvedView | null }>);
  }
  fail(): void {
    this.onerror?.({ message: 'stopped' } as ErrorEvent);
  }
}

/** A ring of n walls, one held at 800 K (the rest reradiating). */
const heldRing = (n: number) => ring(n, (k) => (k === 0 ? { temperature: 800 } : undefined));

function withWorkers(doc: SketchFile): { store: AppStore; made: StandInWorker[] } {
  const made: StandInWorker[] = [];
  const store = createAppStore(doc);
  startLiveResults(store, inThread, documentApi);
  startLiveExchange(store, () => {
    const w = new StandInWorker();
    made.push(w);
    return w;
  });
  return { store, made };
}

const big = heldRing(LIVE_SOLVE_LIMIT + 20);

describe('the exchange of a large sketch, solved off the page', () => {
  it('is solved in the worker, with the numbers of the page’s own solve', async () => {
    const { store, made } = withWorkers(big);
    await flush();
    expect(made).toHaveLength(1);
    expect(made[0].posted).toHaveLength(1);
    expect(store.getState().exchange.kind).toBe('none'); // nothing yet: the page did not solve it
    made[0].answer();
    await flush();
    const ex = solved(store);
    expect(ex.stale).toBe(false);
    const onPage = live(big); // no worker: solved in this thread
    await flush();
    expect(Array.from(ex.result.netHeat)).toEqual(Array.from(solved(onPage).result.netHeat));
    expect(Array.from(ex.result.temperature)).toEqual(Array.from(solved(onPage).result.temperature));
    // Reradiating walls around one wall at 800 K settle at 800 K (equilibrium, common practice).
    for (const T of ex.result.temperature) expect(Math.abs(T - 800)).toBeLessThanOrEqual(1e-9 * 800);
  });

  it('shows the last answer as stale while an edit is solved, and only the newest edit’s answer', async () => {
    const { store, made } = withWorkers(big);
    await flush();
    made[0].answer();
    await flush();
    const first = solved(store);
    store.getState().edit((d) => setCondition(d, 'wall 0', { kind: 'temperature', temperature: 900 }));
    // The same factors: the worker holds them, so the edit posts none.
    expect(made[0].posted[0].factors).toBeNull();
    expect(solved(store).stale).toBe(true);
    expect(solved(store).result).toBe(first.result);
    // A second edit before the first is answered: the first job's worker is ended, a new one takes the second.
    store.getState().edit((d) => setCondition(d, 'wall 0', { kind: 'temperature', temperature: 1000 }));
    expect(made).toHaveLength(2);
    expect(made[0].terminated).toBe(true);
    expect(made[1].posted[0].factors?.F).toHaveLength((LIVE_SOLVE_LIMIT + 20) ** 2); // a new worker gets them
    made[1].answer();
    await flush();
    const last = solved(store);
    expect(last.stale).toBe(false);
    for (const T of last.result.temperature) expect(Math.abs(T - 1000)).toBeLessThanOrEqual(1e-9 * 1000);
    // The ended worker's late answer (were it to come) is never shown.
    made[0].answer();
    await flush();
    expect(solved(store)).toBe(last);
  });

  it('posts no second job when the shown factors come again unchanged while one is solved', async () => {
    const { store, made } = withWorkers(big);
    await flush();
    expect(made[0].posted).toHaveLength(1);
    store.setState({ viewFactors: { ...store.getState().viewFactors } }); // a new cache object, the same factors
    expect(made).toHaveLength(1);
    expect(made[0].posted).toHaveLength(1);
    expect(made[0].terminated).toBe(false);
    made[0].answer();
    await flush();
    expect(solved(store).stale).toBe(false);
  });

  it('ends a worker left idle for a minute (its memory with it); the next edit takes a new one', async () => {
    const { store, made } = withWorkers(big);
    await flush();
    vi.useFakeTimers();
    try {
      made[0].answer();
      await vi.advanceTimersByTimeAsync(0);
      expect(solved(store).stale).toBe(false);
      await vi.advanceTimersByTimeAsync(EXCHANGE_LINGER_MS - 1000);
      expect(made[0].terminated).toBe(false);
      await vi.advanceTimersByTimeAsync(1000);
      expect(made[0].terminated).toBe(true);
      store.getState().edit((d) => setCondition(d, 'wall 0', { kind: 'temperature', temperature: 700 }));
      expect(made).toHaveLength(2);
      expect(made[1].posted[0].factors).not.toBeNull(); // the new worker holds nothing yet
      made[1].answer();
      await vi.advanceTimersByTimeAsync(0);
      for (const T of solved(store).result.temperature) expect(Math.abs(T - 700)).toBeLessThanOrEqual(1e-9 * 700);
    } finally {
      vi.useRealTimers();
    }
  });

  it('after a drag, solves with the dragged factors even when their matrix is one the worker held, refilled', async () => {
    // Two walls held apart, so every other wall's temperature depends on the geometry.
    const doc = ring(LIVE_SOLVE_LIMIT + 20, (k) =>
      k === 0 ? { temperature: 800 } : k === 170 ? { temperature: 400 } : undefined,
    );
    const { store, made } = withWorkers(doc);
    await flush();
    made[0].answer();
    await flush();
    const heldF = shownResult(store.getState().viewFactors)!.result.F;
    // A drag of several steps: the answers in between are retired and their matrices reused
    // for later sums (results/derive.ts), the one the worker holds among them.
    store.getState().beginGesture();
    let refilled = false;
    for (let step = 1; step <= 6; step++) {
      store.getState().updateGesture(setVertex(store.getState().doc, 0, 5, [0.9 + 0.01 * step, 0.1]));
      await flush();
      refilled ||= shownResult(store.getState().viewFactors)!.result.F === heldF;
    }
    // End on a step whose matrix is the held one, refilled (the case the worker must not trust by identity).
    for (let step = 7; step <= 12 && !refilled; step++) {
      store.getState().updateGesture(setVertex(store.getState().doc, 0, 5, [0.9 + 0.01 * step, 0.1]));
      await flush();
      refilled = shownResult(store.getState().viewFactors)!.result.F === heldF;
    }
    expect(refilled).toBe(true);
    store.getState().endGesture();
    await flush();
    made.at(-1)!.answer();
    await flush();
    const onPage = live(store.getState().doc);
    await flush();
    expect(Array.from(solved(store).result.netHeat)).toEqual(Array.from(solved(onPage).result.netHeat));
  });

  it('is solved on the page when the worker fails', async () => {
    const { store, made } = withWorkers(big);
    await flush();
    made[0].fail();
    await flush();
    const ex = solved(store);
    expect(ex.stale).toBe(false);
    expect(ex.names).toHaveLength(LIVE_SOLVE_LIMIT + 20);
    expect(made[0].terminated).toBe(true);
  });

  it('a sketch of few surfaces never waits for a worker', async () => {
    const { store, made } = withWorkers(heldRing(12));
    await flush();
    expect(solved(store).stale).toBe(false);
    expect(made).toHaveLength(0);
  });
});
