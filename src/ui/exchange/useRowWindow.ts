// Which rows of a long table are in view (the table's parent scrolls), so a
// 1000-surface exchange table draws a few dozen rows.
import { useLayoutEffect, useState, type RefObject } from 'react';
import { useVirtualizer } from '@tanstack/react-virtual';

/** Above this many rows the table is windowed. */
export const ROWS_WINDOW_FROM = 100;
/** Height assumed for a row before one is measured, px. */
const ROW_GUESS_PX = 22;
const OVERSCAN = 6;

export interface RowWindow {
  rows: number[];
  /** Height (px) of the rows left out above and below the drawn ones. */
  before: number;
  after: number;
}

/** `content` is what the table shows (a new one can change the row height); the table's parent is the scrolled box. */
export function useRowWindow(table: RefObject<HTMLTableElement | null>, n: number, content: unknown): RowWindow {
  const [layout, setLayout] = useState({ top: 0, pitch: ROW_GUESS_PX });
  // eslint-disable-next-line react-hooks/incompatible-library -- read afresh on every render, never memoised
  const v = useVirtualizer({
    count: n,
    getScrollElement: () => table.current?.parentElement ?? null,
    estimateSize: () => layout.pitch,
    overscan: OVERSCAN,
    scrollMargin: layout.top,
    // Before the first layout (and in a DOM without one) assume a box about this size.
    initialRect: { width: 800, height: 400 },
  });
  const items = v.getVirtualItems();
  const before = items.length ? items[0].start - layout.top : 0;

  // Measure where the first row starts and the distance between rows; re-window when they differ.
  useLayoutEffect(() => {
    const t = table.current;
    const rows = t ? [...(t.tBodies[0]?.rows ?? [])].filter((r) => r.getAttribute('aria-rowindex') !== null) : [];
    if (!t || rows.length === 0) return;
    const top = t.offsetTop + rows[0].offsetTop - before;
    const pitch = rows.length > 1 ? rows[1].offsetTop - rows[0].offsetTop : layout.pitch;
    if (Math.abs(top - layout.top) >= 0.5 || (pitch > 0 && Math.abs(pitch - layout.pitch) >= 0.5))
      setLayout({ top, pitch: pitch > 0 ? pitch : layout.pitch });
  }, [table, before, layout, n, content]);
  useLayoutEffect(() => v.measure(), [layout.pitch, v]);

  const end = items.length ? items[items.length - 1].end - layout.top : 0;
  return { rows: items.map((r) => r.index), before, after: Math.max(0, v.getTotalSize() - end) };
}
