// The tool registry is the one place a tool joins: a throwaway tool written here,
// listed in a fresh registry, is driven through the real controller and store
// with no other module knowing of it.
import { describe, expect, it } from 'vitest';
import { createAppStore } from '../../../src/state/store';
import { CanvasController } from '../../../src/state/canvasController';
import { emptySketch } from '../../../src/state/documentSlice';
import { createToolRegistry, toolRegistry, TOOLS } from '../../../src/state/tools/registry';
import { selectTool } from '../../../src/state/tools/select';
import { placeShape } from '../../../src/state/tools/placeShape';
import type { DrawingTool } from '../../../src/state/tools/tool';
import { restore } from '../../../src/document';
import type { Point } from '../../../src/state/sketchFile';

const at = (p: Point, shift = false) => ({ at: p, shift, tolerance: 0.05 });

/** Stamps a unit right triangle with its right angle at the (snapped) press; counts its stamps. */
const stampTool: DrawingTool<{ stamps: number }, 'stamp'> = {
  id: 'stamp',
  label: 'Stamp',
  shortcut: 'S',
  hint: 'Click to stamp a triangle',
  cursor: 'crosshair',
  init: () => ({ stamps: 0 }),
  press(ctx, e) {
    const [x, y] = ctx.snapped(e.at);
    placeShape(ctx.get, 'solid', [
      [x, y],
      [x + 1, y],
      [x, y + 1],
    ]);
    ctx.gesture.stamps += 1;
    return 'handled';
  },
  move() {},
  release() {},
  keyDown(ctx, key) {
    if (key !== 'Enter') return false;
    ctx.get().notify('info', `stamps so far: ${ctx.gesture.stamps}`);
    return true;
  },
  cancel: () => false,
  draft: () => null,
};

describe('a tool joins through the registry alone', () => {
  it('drives a throwaway tool through the controller: press, keys, Escape and tool switches', () => {
    const registry = createToolRegistry([selectTool, stampTool]);
    const store = createAppStore(emptySketch);
    const c = new CanvasController(store, registry);
    store.getState().setGridStep(0.5);
    store.setState({ tool: 'stamp' });
    expect(c.press(at([1.1, 2.2]))).toBe('handled');
    c.release(at([1.1, 2.2]));
    const shape = store.getState().doc.shapes[0];
    expect(shape.kind).toBe('solid');
    expect(shape.points).toEqual([
      [1, 2],
      [2, 2],
      [1, 3],
    ]); // (1.1, 2.2) snaps to (1, 2) on a 0.5 grid
    expect(restore(store.getState().doc).ok).toBe(true);
    expect(store.getState().selection).toEqual([{ type: 'shape', shape: 0 }]);
    c.press(at([3, 3]));
    expect(c.key('Enter')).toBe(true);
    expect(store.getState().notices.at(-1)?.text).toBe('stamps so far: 2');
    expect(c.key('x')).toBe(false);
    c.cancel(); // nothing in flight: Escape clears the selection
    expect(store.getState().selection).toEqual([]);
    // Leaving and coming back gives the tool fresh in-flight state.
    store.getState().setTool('select');
    c.press(at([10, 10]));
    store.setState({ tool: 'stamp' });
    c.key('Enter');
    expect(store.getState().notices.at(-1)?.text).toBe('stamps so far: 0');
    expect(registry.byShortcut('s')).toBe(stampTool);
    expect(registry.byShortcut('V')).toBe(selectTool);
  });

  it('names an unknown tool id, and refuses repeated ids, repeated shortcuts and an empty list', () => {
    const store = createAppStore(emptySketch);
    const c = new CanvasController(store, createToolRegistry([selectTool]));
    store.setState({ tool: 'stamp' });
    expect(() => c.press(at([0, 0]))).toThrow(/No drawing tool "stamp"; the tools are select/);
    expect(() => createToolRegistry([selectTool, { ...stampTool, id: 'select' }])).toThrow(/id "select"/);
    expect(() => createToolRegistry([selectTool, { ...stampTool, shortcut: 'v' }])).toThrow(
      /"select" and "stamp" share the shortcut "v"/,
    );
    expect(() => createToolRegistry([])).toThrow(/at least one tool/);
  });
});

describe('the app registry', () => {
  it('lists the tools in toolbar order with their shortcuts, select first and active at start', () => {
    expect(TOOLS.map((t) => [t.id, t.shortcut])).toEqual([
      ['select', 'v'],
      ['enclosure', 'e'],
      ['solid', 'b'],
      ['rectangle', 'r'],
      ['tube', 't'],
    ]);
    expect(toolRegistry.tools.map((t) => t.label)).toEqual(['Select', 'Enclosure', 'Body', 'Rectangle', 'Tube']);
    expect(createAppStore(emptySketch).getState().tool).toBe('select');
    expect(toolRegistry.tools.filter((t) => t.showsAllHandles).map((t) => t.id)).toEqual(['select']);
    expect(toolRegistry.tools.map((t) => t.cursor)).toEqual([
      'default',
      'crosshair',
      'crosshair',
      'crosshair',
      'crosshair',
    ]);
  });

  it('switching tools mid-drag drops the drag as Escape does, leaving no gesture open', () => {
    const store = createAppStore({
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [4, 0],
            [4, 4],
            [0, 4],
          ],
          surface: 'wall',
        },
      ],
    });
    const before = store.getState().doc;
    const c = new CanvasController(store);
    store.getState().setSnap(false);
    c.press(at([4, 4]));
    c.move(at([5, 5]));
    expect(c.dragging).toBe(true);
    store.getState().setTool('enclosure');
    expect(c.dragging).toBe(false);
    expect(store.getState().doc).toBe(before);
    expect(store.getState().gestureBase).toBeNull();
    expect(store.getState().past).toHaveLength(0);
  });
});
