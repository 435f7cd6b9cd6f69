// @vitest-environment jsdom
// A large matrix is windowed: only the rows and columns in view are in the
// document, each with its place in the whole (aria-rowindex / aria-colindex),
// headed and valued like the full table. jsdom has no layout, so the scrolled
// box reports a fixed size here; the browser benchmark drags the real thing.
import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import { stubScrollBox } from './scrollBox';
import { MatrixTable } from '../../src/ui/matrix/MatrixTable';
import { matrixView } from '../../src/state/matrixView';
import { WINDOW_FROM } from '../../src/ui/matrix/useMatrixWindow';
import { fmtFactor } from '../../src/ui/matrix/format';
import type { ShownResult } from '../../src/state/results/derive';

const N = 300;

/** N surfaces of length 1 with F_ij = (i + 1)(j + 1) / 10^6: reciprocal, and each cell's number names its column (only where numbers land is checked). */
function shown(): ShownResult {
  const F = new Float64Array(N * N);
  for (let i = 0; i < N; i++) for (let j = 0; j < N; j++) F[i * N + j] = ((i + 1) * (j + 1)) / 1e6;
  return {
    sketch: { version: 1, units: 'm', shapes: [], surfaces: {}, settings: {} },
    names: Array.from({ length: N }, (_, i) => `s${i + 1}`),
    units: 'm',
    stale: false,
    elapsedMs: 1,
    result: {
      edgeCount: N,
      surfaceCount: N,
      closed: true,
      edgeLength: new Float64Array(N).fill(1),
      surfaceLength: new Float64Array(N).fill(1),
      F,
      rowSumResidual: new Float64Array(N),
      reciprocityResidual: 0,
    },
  };
}

stubScrollBox();

describe('windowed matrix table', () => {
  it('draws a window of rows and columns, each knowing its place, with the right numbers', () => {
    expect(N).toBeGreaterThan(WINDOW_FROM);
    render(
      <div>
        <MatrixTable
          view={matrixView(shown())}
          digits={6}
          units="m"
          order={new Map()}
          selected={new Set()}
          hoverPair={null}
          onHover={() => {}}
          stale={false}
        />
      </div>,
    );
    const table = screen.getByRole('table', { name: /view factor/i });
    expect(table.getAttribute('aria-rowcount')).toBe(String(N + 1));
    expect(table.getAttribute('aria-colcount')).toBe(String(N + 3));
    const heads = within(table).getAllByRole('rowheader');
    expect(heads.length).toBeGreaterThan(5);
    expect(heads.length).toBeLessThan(N / 4);
    // Row i (0-based) is row i + 2 of the whole table (the header row is 1).
    for (const h of heads) {
      const row = h.closest('tr')!;
      const i = Number(row.getAttribute('aria-rowindex')) - 2;
      expect(h.textContent).toContain(`s${i + 1}`);
      const cells = within(row)
        .getAllByRole('cell')
        .filter((c) => c.classList.contains('cell'));
      expect(cells.length).toBeGreaterThan(3);
      expect(cells.length).toBeLessThan(N / 4);
      for (const c of cells) {
        const j = Number(c.getAttribute('aria-colindex')) - 3;
        expect(c.textContent).toBe(fmtFactor(((i + 1) * (j + 1)) / 1e6, 6));
        expect(c.title).toBe(`F from s${i + 1} to s${j + 1} = ${((i + 1) * (j + 1)) / 1e6}`);
      }
    }
    // Column headers in view are named, and the residual column keeps its heading at the far end.
    const cols = within(table).getAllByRole('columnheader');
    expect(within(table).getByRole('columnheader', { name: 's1' })).toBeTruthy();
    expect(cols.at(-1)!.textContent).toBe('1 − Σ');
    expect(cols.at(-1)!.getAttribute('aria-colindex')).toBe(String(N + 3));
  });
});
