// Two tabs on one sketch: never two writers. The tab that opens second says
// so and offers to take over; the first then stops saving. A lease left behind
// by a closed tab is taken after a short wait; two tabs that claim at the same
// moment sort it out at the next write.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { AUTOSAVE_KEY, ELSEWHERE_TEXT, RELEASED_TEXT, startAutosave } from '../../../src/state/autosave';
import { LEASE_ANSWER_MS, LEASE_KEY, TabLease } from '../../../src/state/tabs/lease';
import { documentApi } from '../../../src/state/documentApi';
import { createAppStore, type AppStore } from '../../../src/state/store';
import { setVertex } from '../../../src/state/edits/shapeEdits';
import type { SketchFile } from '../../../src/state/sketchFile';
import { demoSketch } from '../../../src/state/demo';
import { MemoryStorage } from '../memoryStorage';
import { FakeBus } from './fakeChannel';

const box: SketchFile = {
  ...demoSketch,
  units: 'cm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [40, 0],
        [40, 20],
        [0, 20],
      ],
      surface: ['floor', 'right', 'roof', 'left'],
    },
  ],
  surfaces: undefined,
  settings: undefined,
};

const flush = () => new Promise<void>((r) => setTimeout(r, 0));
const corner = (storage: MemoryStorage): unknown =>
  (JSON.parse(storage.getItem(AUTOSAVE_KEY) ?? 'null') as SketchFile | null)?.shapes[0].points[2];
const moveCorner = (store: AppStore, y: number) => store.getState().edit((d) => setVertex(d, 0, 2, [40, y]));
const noticeWith = (store: AppStore, text: string) => store.getState().notices.find((n) => n.text === text);

afterEach(() => vi.useRealTimers());

describe('two tabs on one sketch', () => {
  it('the second tab says so and does not write; taking over stops the first', async () => {
    const storage = new MemoryStorage();
    const bus = new FakeBus();
    const a = createAppStore(box);
    const stopA = startAutosave(a, storage, documentApi, { channel: bus.channel(), tabId: 'A' });
    moveCorner(a, 21);
    expect(corner(storage)).toEqual([40, 21]);

    // Tab B opens on the same storage (it would show A's autosave).
    const b = createAppStore(a.getState().doc);
    const stopB = startAutosave(b, storage, documentApi, { channel: bus.channel(), tabId: 'B' });
    await flush();
    const offer = noticeWith(b, ELSEWHERE_TEXT);
    expect(offer?.action?.kind).toBe('run');
    expect(offer?.action?.label).toBe('Take over here');
    expect(noticeWith(a, ELSEWHERE_TEXT)).toBeUndefined();

    // B's edits are not written; A's still are.
    moveCorner(b, 30);
    expect(corner(storage)).toEqual([40, 21]);
    moveCorner(a, 22);
    expect(corner(storage)).toEqual([40, 22]);

    // B takes over: its own edited sketch is written at once, A stops and is told.
    if (offer?.action?.kind !== 'run') throw new Error('no take-over action');
    offer.action.run();
    expect(storage.getItem(LEASE_KEY)).toBe('B');
    expect(corner(storage)).toEqual([40, 30]);
    expect(noticeWith(b, ELSEWHERE_TEXT)).toBeUndefined();
    await flush();
    expect(noticeWith(a, ELSEWHERE_TEXT)?.action?.label).toBe('Take over here');
    moveCorner(a, 23);
    expect(corner(storage)).toEqual([40, 30]);
    moveCorner(b, 31);
    expect(corner(storage)).toEqual([40, 31]);
    stopA();
    stopB();
  });

  it('a tab untouched since it opened carries on from the other tab’s latest copy when it takes over', async () => {
    const storage = new MemoryStorage();
    const bus = new FakeBus();
    const a = createAppStore(box);
    const stopA = startAutosave(a, storage, documentApi, { channel: bus.channel(), tabId: 'A' });
    const b = createAppStore(box);
    const stopB = startAutosave(b, storage, documentApi, { channel: bus.channel(), tabId: 'B' });
    await flush();
    moveCorner(a, 25); // A keeps working after B opened
    const offer = noticeWith(b, ELSEWHERE_TEXT)?.action;
    if (offer?.kind !== 'run') throw new Error('no take-over action');
    offer.run();
    expect(b.getState().doc.shapes[0].points[2]).toEqual([40, 25]);
    expect(corner(storage)).toEqual([40, 25]);
    stopA();
    stopB();
  });

  it('a lease left by a closed tab is taken after a short wait, and edits made meanwhile are written', async () => {
    vi.useFakeTimers();
    const storage = new MemoryStorage();
    storage.setItem(LEASE_KEY, 'gone'); // a tab that crashed without letting go
    const bus = new FakeBus();
    const b = createAppStore(box);
    const stop = startAutosave(b, storage, documentApi, { channel: bus.channel(), tabId: 'B' });
    expect(bus.log).toEqual([{ type: 'who', from: 'B' }]);
    moveCorner(b, 27);
    expect(storage.getItem(AUTOSAVE_KEY)).toBeNull(); // not yet: someone may still hold it
    await vi.advanceTimersByTimeAsync(LEASE_ANSWER_MS + 1);
    expect(storage.getItem(LEASE_KEY)).toBe('B');
    expect(corner(storage)).toEqual([40, 27]);
    expect(noticeWith(b, ELSEWHERE_TEXT)).toBeUndefined();
    stop();
  });

  it('when the saving tab closes, the waiting tab is told and may take over; nothing is overwritten until it does', async () => {
    const storage = new MemoryStorage();
    const bus = new FakeBus();
    const a = createAppStore(box);
    const stopA = startAutosave(a, storage, documentApi, { channel: bus.channel(), tabId: 'A' });
    moveCorner(a, 21);
    const b = createAppStore(a.getState().doc);
    const stopB = startAutosave(b, storage, documentApi, { channel: bus.channel(), tabId: 'B' });
    await flush();
    moveCorner(b, 35);
    moveCorner(a, 22);
    stopA(); // tab A closes
    expect(storage.getItem(LEASE_KEY)).toBeNull();
    await flush();
    const told = noticeWith(b, RELEASED_TEXT);
    expect(told?.action?.kind).toBe('run');
    expect(corner(storage)).toEqual([40, 22]); // A's last copy stays until B takes over
    if (told?.action?.kind !== 'run') throw new Error('no take-over action');
    told.action.run();
    expect(storage.getItem(LEASE_KEY)).toBe('B');
    expect(corner(storage)).toEqual([40, 35]);
    stopB();
  });

  it('two tabs that claim at the same moment: the one that finds the other id stops at its next write', () => {
    const storage = new MemoryStorage();
    const changes: string[] = [];
    // No channel: each sees a free lease and claims it.
    const a = new TabLease({ storage, channel: null, id: 'A', onChange: (s) => changes.push(`A ${s}`) });
    const b = new TabLease({ storage, channel: null, id: 'B', onChange: (s) => changes.push(`B ${s}`) });
    expect(b.mayWrite()).toBe(true);
    expect(a.mayWrite()).toBe(false);
    expect(a.current).toBe('elsewhere');
    expect(changes).toEqual(['A holder', 'B holder', 'A elsewhere']);
    // Closing the holder frees the lease for the next tab.
    b.release();
    expect(storage.getItem(LEASE_KEY)).toBeNull();
    a.release();
  });
});
