import { afterEach, beforeEach, vi } from 'vitest';
import { cleanup } from '@testing-library/react';

/**
 * jsdom has no layout: for the tests of windowed tables the scrolled box reports
 * a fixed size (800 x 400 px), as the virtualizer reads it; cleaned up after each test.
 */
export function stubScrollBox(): void {
  beforeEach(() => {
    vi.spyOn(HTMLElement.prototype, 'clientWidth', 'get').mockReturnValue(800);
    vi.spyOn(HTMLElement.prototype, 'clientHeight', 'get').mockReturnValue(400);
  });
  afterEach(() => {
    cleanup();
    vi.restoreAllMocks();
  });
}
