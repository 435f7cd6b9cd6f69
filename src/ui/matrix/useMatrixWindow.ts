// Which rows and columns of a large matrix table are in view (the table's parent
// scrolls), so a 1000-surface matrix draws a few hundred cells, not a million.
import { useLayoutEffect, useState, type RefObject } from 'react';
import { useVirtualizer } from '@tanstack/react-virtual';
import type { ColumnWindow } from './MatrixRow';

/**
 * Above this many surfaces the matrix is windowed. At 54 surfaces a full table has
 * 2916 cells, and an answer every 50 ms during a drag restyled them all: the exact-tube
 * furnace drag drew 9-39 frames a second with the full table, 56 windowed.
 */
export const WINDOW_FROM = 30;
/** Row height of a windowed table, px (set in panels.css through --row-px). */
export const ROW_PX = 22;
/** Rows and columns drawn beyond the visible ones on each side. */
const OVERSCAN = 4;

/** Width of a factor cell, px: "0." and `digits` decimals at about 7 px a figure, room for " ⚠", and padding. */
export function cellWidthPx(digits: number): number {
  return Math.ceil((digits + 2) * 7 + 14 + 8);
}

interface Layout {
  /** Offset (px) of the first data row from the top of the scrolled box, and of the first factor column from its left. */
  top: number;
  left: number;
  /** Measured distance between rows and between factor columns, px (borders make it differ from the set size). */
  rowPitch: number;
  colPitch: number;
}

export interface MatrixWindow {
  rows: number[];
  cols: ColumnWindow;
  pad: { before: number; after: number };
}

/**
 * `content` is what the table shows (a new one can move where the cells start);
 * the table's parent is the scrolled box. `rowCount` and `colCount` are the rows
 * and windowed columns (class "vcol" on their headers), after `leading` columns
 * that are always drawn.
 */
export function useMatrixWindow(
  table: RefObject<HTMLTableElement | null>,
  rowCount: number,
  colCount: number,
  cellPx: number,
  content: unknown,
  leading = 2,
): MatrixWindow {
  const [layout, setLayout] = useState<Layout>({ top: 0, left: 0, rowPitch: ROW_PX, colPitch: cellPx });
  const scrollBox = () => table.current?.parentElement ?? null;
  // eslint-disable-next-line react-hooks/incompatible-library -- read afresh on every render, never memoised
  const rowV = useVirtualizer({
    count: rowCount,
    getScrollElement: scrollBox,
    estimateSize: () => layout.rowPitch,
    overscan: OVERSCAN,
    scrollMargin: layout.top,
    // Before the first layout (and in a DOM without one) assume a panel of about this size.
    initialRect: { width: 800, height: 400 },
  });
  const colV = useVirtualizer({
    count: colCount,
    horizontal: true,
    getScrollElement: scrollBox,
    estimateSize: () => layout.colPitch,
    overscan: OVERSCAN,
    scrollMargin: layout.left,
    initialRect: { width: 800, height: 400 },
  });

  const rItems = rowV.getVirtualItems();
  const cItems = colV.getVirtualItems();
  const firstRow = rItems[0]?.index ?? -1;
  const firstCol = cItems[0]?.index ?? -1;

  // Measure where the data cells start and how far apart they are; re-window when that differs.
  useLayoutEffect(() => {
    const t = table.current;
    const head = t?.tHead?.rows[0];
    const body = t?.tBodies[0];
    if (!t || !head || !body) return;
    const lHead = head.cells[leading - 1];
    const cols = [...head.cells].filter((c) => c.classList.contains('vcol'));
    const rows = [...body.rows].filter((r) => r.getAttribute('aria-rowindex') !== null);
    const next: Layout = {
      top: t.offsetTop + (rows[0]?.offsetTop ?? head.offsetTop + head.offsetHeight),
      left: t.offsetLeft + lHead.offsetLeft + lHead.offsetWidth,
      rowPitch: rows.length > 1 ? rows[1].offsetTop - rows[0].offsetTop : layout.rowPitch,
      colPitch: cols.length > 1 ? cols[1].offsetLeft - cols[0].offsetLeft : cellPx,
    };
    // Each row or column measured before the first drawn one shifts the window.
    if (rows[0]) next.top -= rowV.getVirtualItems()[0]?.start - layout.top || 0;
    if (cols[0])
      next.left = t.offsetLeft + cols[0].offsetLeft - ((colV.getVirtualItems()[0]?.start ?? 0) - layout.left);
    const same = (a: number, b: number) => Math.abs(a - b) < 0.5;
    if (
      (next.rowPitch > 0 && !same(next.rowPitch, layout.rowPitch)) ||
      (next.colPitch > 0 && !same(next.colPitch, layout.colPitch)) ||
      !same(next.top, layout.top) ||
      !same(next.left, layout.left)
    ) {
      setLayout({
        top: next.top,
        left: next.left,
        rowPitch: next.rowPitch > 0 ? next.rowPitch : layout.rowPitch,
        colPitch: next.colPitch > 0 ? next.colPitch : layout.colPitch,
      });
    }
  }, [table, layout, cellPx, rowV, colV, firstRow, firstCol, rowCount, colCount, content, leading]);
  useLayoutEffect(() => {
    rowV.measure();
    colV.measure();
  }, [layout.rowPitch, layout.colPitch, rowV, colV]);

  const rowTotal = rowV.getTotalSize();
  const colTotal = colV.getTotalSize();
  const rowEnd = rItems.length ? rItems[rItems.length - 1].end - layout.top : 0;
  const colEnd = cItems.length ? cItems[cItems.length - 1].end - layout.left : 0;
  return {
    rows: rItems.map((r) => r.index),
    cols: {
      start: cItems[0]?.index ?? 0,
      end: cItems.length ? cItems[cItems.length - 1].index + 1 : 0,
      before: cItems.length ? cItems[0].start - layout.left : 0,
      after: Math.max(0, colTotal - colEnd),
    },
    pad: { before: rItems.length ? rItems[0].start - layout.top : 0, after: Math.max(0, rowTotal - rowEnd) },
  };
}
