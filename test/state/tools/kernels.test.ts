// The pure kernels behind the select tool (hit testing, press and drag planning)
// and the pictures the drawing tools hand to the draft layer.
import { describe, expect, it } from 'vitest';
import { hitTest } from '../../../src/state/tools/hitTest';
import { dragOffset, pressSelect } from '../../../src/state/tools/selectTool';
import { bodyTool, enclosureTool } from '../../../src/state/tools/outline';
import { rectangleTool } from '../../../src/state/tools/rectangle';
import { tubeTool } from '../../../src/state/tools/tube';
import { selectTool } from '../../../src/state/tools/select';
import type { SketchFile } from '../../../src/state/sketchFile';

// A 4 x 2 enclosure with a 1 x 1 block whose lower-left corner is at (1, 0.5).
const doc: SketchFile = {
  version: 1,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [4, 0],
        [4, 2],
        [0, 2],
      ],
      surface: 'wall',
    },
    {
      kind: 'solid',
      points: [
        [1, 0.5],
        [2, 0.5],
        [2, 1.5],
        [1, 1.5],
      ],
      surface: 'block',
    },
  ],
};

describe('hitTest', () => {
  it('prefers a vertex, then an edge (with the nearest point on it), then the innermost shape', () => {
    expect(hitTest(doc, [2.03, 1.52], 0.05)).toEqual({ type: 'vertex', shape: 1, index: 2 });
    // 0.04 below the block's top edge, 0.5 from its corners: the edge, foot of the perpendicular at (1.5, 1.5).
    expect(hitTest(doc, [1.5, 1.46], 0.05)).toEqual({ type: 'edge', shape: 1, index: 2, at: [1.5, 1.5] });
    expect(hitTest(doc, [1.5, 1], 0.05)).toEqual({ type: 'shape', shape: 1 }); // inside both: the block
    expect(hitTest(doc, [3, 1], 0.05)).toEqual({ type: 'shape', shape: 0 });
    expect(hitTest(doc, [5, 1], 0.05)).toBeNull();
  });

  it('takes the nearer of two vertices within reach, and nothing beyond the tolerance', () => {
    const close: SketchFile = {
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'solid',
          points: [
            [0, 0],
            [0.06, 0],
            [0, 1],
          ],
          surface: 's',
        },
      ],
    };
    expect(hitTest(close, [0.04, 0], 0.05)).toEqual({ type: 'vertex', shape: 0, index: 1 });
    expect(hitTest(doc, [5.06, 1], 0.05)).toBeNull();
  });
});

describe('pressSelect and dragOffset', () => {
  it('a press on an unselected edge selects it alone and plans a drag from its first end', () => {
    const r = pressSelect(
      doc,
      [{ type: 'shape', shape: 0 }],
      { type: 'edge', shape: 1, index: 0, at: [1.5, 0.5] },
      [1.5, 0.52],
      false,
    );
    expect(r.selection).toEqual([{ type: 'edge', shape: 1, index: 0 }]);
    expect(r.drag).toEqual({ picks: r.selection, anchor: [1.5, 0.52], reference: [1, 0.5] });
  });

  it('shift adds to the selection; shift on a selected item removes it and plans no drag; empty space clears unless shift', () => {
    const first = { type: 'vertex', shape: 1, index: 0 } as const;
    const added = pressSelect(doc, [first], { type: 'vertex', shape: 1, index: 1 }, [2, 0.5], true);
    expect(added.selection).toEqual([first, { type: 'vertex', shape: 1, index: 1 }]);
    const removed = pressSelect(doc, added.selection, { type: 'vertex', shape: 1, index: 1 }, [2, 0.5], true);
    expect(removed).toEqual({ selection: [first], drag: null });
    expect(pressSelect(doc, [first], null, [9, 9], false)).toEqual({ selection: [], drag: null });
    expect(pressSelect(doc, [first], null, [9, 9], true)).toEqual({ selection: [first], drag: null });
  });

  it('a press on a selected item keeps the whole selection for the drag', () => {
    const sel = [{ type: 'vertex', shape: 1, index: 0 } as const, { type: 'vertex', shape: 1, index: 1 } as const];
    const r = pressSelect(doc, sel, { type: 'vertex', shape: 1, index: 1 }, [2, 0.5], false);
    expect(r.selection).toEqual(sel);
    expect(r.drag?.picks).toEqual(sel);
  });

  it('moves the reference point onto the grid, not the pointer', () => {
    const plan = { picks: [], anchor: [1.02, 0.49] as [number, number], reference: [1.03, 0.5] as [number, number] };
    // Reference + pointer travel = (1.03 + 0.61, 0.5 + 0.22) = (1.64, 0.72) -> grid 0.25 -> (1.75, 0.75).
    const [dx, dy] = dragOffset(plan, [1.63, 0.71], 0.25, true);
    expect(dx).toBeCloseTo(0.72, 12);
    expect(dy).toBeCloseTo(0.25, 12);
    const [ux, uy] = dragOffset(plan, [1.63, 0.71], 0.25, false);
    expect(ux).toBeCloseTo(0.61, 12);
    expect(uy).toBeCloseTo(0.22, 12);
  });
});

describe('draft pictures', () => {
  it('outline tools: open rubber band to the pointer, handles on the clicked points, a dot before the first click', () => {
    expect(enclosureTool.draft([], null)).toBeNull();
    expect(enclosureTool.draft([], [1, 1])).toEqual({
      points: [],
      closed: false,
      marks: [],
      dot: [1, 1],
      tone: 'enclosure',
    });
    expect(
      bodyTool.draft(
        [
          [0, 0],
          [1, 0],
        ],
        [1, 1],
      ),
    ).toEqual({
      points: [
        [0, 0],
        [1, 0],
        [1, 1],
      ],
      closed: false,
      marks: [
        [0, 0],
        [1, 0],
      ],
      dot: null,
      tone: 'body',
    });
    expect(enclosureTool.progress?.([[0, 0]])).toBe(' — 1 point so far');
    expect(
      enclosureTool.progress?.([
        [0, 0],
        [1, 0],
      ]),
    ).toBe(' — 2 points so far');
    expect(enclosureTool.progress?.([])).toBe('');
  });

  it('quick shapes: a closed outline while dragging, nothing before; select draws nothing', () => {
    expect(rectangleTool.draft([], null)).toBeNull();
    expect(
      tubeTool.draft(
        [
          [0, 0],
          [1, 0],
          [0, 1],
        ],
        null,
      ),
    ).toEqual({
      points: [
        [0, 0],
        [1, 0],
        [0, 1],
      ],
      closed: true,
      marks: [],
      dot: null,
      tone: 'body',
    });
    expect(selectTool.draft([], [1, 1])).toBeNull();
  });

  it('settings: rectangle and tube choose what they make (a tube is an exact circle, no sides)', () => {
    expect(selectTool.settings ?? []).toEqual([]);
    expect(rectangleTool.settings?.map((s) => s.label)).toEqual(['makes']);
    expect(tubeTool.settings?.map((s) => s.label)).toEqual(['makes']);
  });
});
