// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { MatrixTable } from '../../src/ui/matrix/MatrixTable';
import { matrixView } from '../../src/state/matrixView';
import type { ShownResult } from '../../src/state/results/derive';

afterEach(() => cleanup());

/** A two-surface result whose reciprocity and row sums are off on purpose, to see them flagged. */
function shown(closed: boolean): ShownResult {
  return {
    sketch: { version: 1, units: 'm', shapes: [], surfaces: {}, settings: {} },
    names: ['inner', 'outer'],
    units: 'm',
    stale: false,
    elapsedMs: 1,
    result: {
      edgeCount: 2,
      surfaceCount: 2,
      closed,
      edgeLength: Float64Array.from([1, 2]),
      surfaceLength: Float64Array.from([1, 2]),
      // L1 F12 = 1 but L2 F21 = 2 * 0.4 = 0.8: a reciprocity residual of 0.2.
      F: Float64Array.from([0, 1, 0.4, 0.6]),
      rowSumResidual: Float64Array.from([0, 1e-6]),
      reciprocityResidual: 0.2,
    },
  };
}

function renderTable(closed = true, onHover = vi.fn()) {
  render(
    <MatrixTable
      view={matrixView(shown(closed))}
      digits={3}
      units="m"
      order={new Map()}
      selected={new Set(['outer'])}
      hoverPair={null}
      onHover={onHover}
      stale={false}
    />,
  );
  return { table: screen.getByRole('table', { name: /view factor/i }), onHover };
}

describe('matrix table', () => {
  it('shows one row per surface with its length, the factors and the row residual', () => {
    const { table } = renderTable();
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(3);
    const cells = within(rows[2])
      .getAllByRole('cell')
      .map((c) => c.textContent);
    expect(cells[0]).toBe('2');
    expect(cells[1]).toMatch(/^0\.400/);
    expect(cells[2]).toMatch(/^0\.600/);
    expect(cells[3]).toBe('1.0e-6');
  });

  it('marks the cells where reciprocity misses the tolerance and warns on a row residual above rounding', () => {
    const { table } = renderTable();
    const flagged = table.querySelectorAll('td.recip-bad');
    expect(flagged).toHaveLength(2); // F12 and F21
    expect(flagged[0].textContent).toContain('⚠');
    expect(table.querySelectorAll('td.warn')).toHaveLength(1);
  });

  it('labels the last column as the factor to the surroundings in an open sketch', () => {
    const { table } = renderTable(false);
    expect(within(table).getByRole('columnheader', { name: /surr/ })).toBeTruthy();
    expect(table.querySelectorAll('td.warn')).toHaveLength(0);
  });

  it('reports the hovered pair and highlights the selected surface', () => {
    const { table, onHover } = renderTable();
    const cell = within(table)
      .getAllByRole('cell')
      .find((c) => c.title.startsWith('F from inner to outer'))!;
    fireEvent.mouseEnter(cell);
    expect(onHover).toHaveBeenLastCalledWith(['inner', 'outer']);
    fireEvent.mouseLeave(table);
    expect(onHover).toHaveBeenLastCalledWith(null);
    expect(within(table).getByRole('rowheader', { name: /outer/ }).closest('tr')!.className).toBe('on');
  });
});
