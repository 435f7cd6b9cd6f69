// @vitest-environment jsdom
// Worker faults as the page shows them: a worker that crashes is replaced and
// the job retried, the page says so and ends up to date; workers that never
// answer end in a stated failure, never in a "computing" marker that stays.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, configure, waitFor } from '@testing-library/react';
import { renderApp } from '../ui/renderApp';
import { viewFactorApi } from '../../src/worker/api';
import type { WorkerHandle } from '../../src/worker/client';

vi.mock('../../src/ui/canvas/SketchCanvas', () => ({ SketchCanvas: () => <div data-testid="canvas-stub" /> }));

configure({ asyncUtilTimeout: 8000 });
afterEach(() => cleanup());

const status = () => document.querySelector('[data-status]');

/** Workers numbered from 0; `fate(n)` says what worker n does with every job. */
function workers(fate: (n: number) => 'crash' | 'hang' | 'work') {
  let spawned = 0;
  return (): WorkerHandle => {
    const what = fate(spawned++);
    let crash: ((m: string) => void) | null = null;
    return {
      compute: (job) => {
        if (what === 'work') return Promise.resolve(viewFactorApi.compute(job));
        if (what === 'crash') setTimeout(() => crash?.('the worker ran out of memory'), 0);
        return new Promise(() => {}); // never answers
      },
      terminate: () => {},
      onCrash: (listener) => {
        crash = listener;
      },
    };
  };
}

describe('worker faults on the page', () => {
  it('a crash: the worker is replaced, the job retried, the page says so and is up to date', async () => {
    const { store } = renderApp({ spawn: workers((n) => (n === 0 ? 'crash' : 'work')) });
    await waitFor(() => expect(status()?.getAttribute('data-status')).toBe('ready'));
    const texts = store.getState().notices.map((n) => n.text);
    expect(
      texts.some((t) => /worker stopped \(the worker ran out of memory\) and was replaced.*tried once more/.test(t)),
    ).toBe(true);
    expect(store.getState().viewFactors.edges).not.toBeNull();
  });

  it('workers that never answer: the job fails after its retry, with a message; nothing stays "computing"', async () => {
    const { store } = renderApp({ spawn: workers(() => 'hang'), timeLimitMs: 30 });
    await waitFor(() => expect(status()?.getAttribute('data-status')).toBe('error'));
    const notices = store.getState().notices;
    expect(notices.some((n) => n.level === 'warning' && /stopped answering.*tried once more/.test(n.text))).toBe(true);
    expect(notices.some((n) => n.level === 'error' && /failed again on a fresh worker/.test(n.text))).toBe(true);
    expect(status()?.textContent).toMatch(/Calculation failed/);
  });
});
