// Stage pointer events -> sketch units -> the canvas controller; empty-space
// drags, the middle button and space+drag pan the camera; the wheel zooms.
import { useEffect, useRef } from 'react';
import type Konva from 'konva';
import { useAppStore, useController } from '../AppContext';
import { toSketch, zoomAt } from '../../state/camera';
import type { Point } from '../../state/sketchFile';

/** Pick radius in screen pixels. */
const PICK_PX = 7;

export function usePointerRouting() {
  const store = useAppStore();
  const controller = useController();
  const pan = useRef<{ from: Point; originX: number; originY: number } | null>(null);
  const space = useRef(false);

  const last = useRef<{ at: Point; shift: boolean; tolerance: number } | null>(null);

  // A drag that ends outside the canvas still ends, and leaves no draft behind.
  useEffect(() => {
    const up = () => {
      pan.current = null;
      if (controller.dragging && last.current) controller.releaseOutside(last.current);
    };
    window.addEventListener('pointerup', up);
    return () => window.removeEventListener('pointerup', up);
  }, [controller]);

  useEffect(() => {
    const down = (e: KeyboardEvent) => {
      if (e.code === 'Space' && !(e.target instanceof HTMLInputElement)) {
        space.current = true;
      }
    };
    const up = (e: KeyboardEvent) => {
      if (e.code === 'Space') space.current = false;
    };
    window.addEventListener('keydown', down);
    window.addEventListener('keyup', up);
    return () => {
      window.removeEventListener('keydown', down);
      window.removeEventListener('keyup', up);
    };
  }, []);

  const info = (e: Konva.KonvaEventObject<MouseEvent | PointerEvent | WheelEvent>) => {
    const stage = e.target.getStage()!;
    const p = stage.getPointerPosition() ?? { x: 0, y: 0 };
    const cam = store.getState().camera;
    last.current = { at: toSketch(cam, [p.x, p.y]), shift: e.evt.shiftKey, tolerance: PICK_PX / cam.scale };
    return {
      screen: [p.x, p.y] as Point,
      at: toSketch(cam, [p.x, p.y]),
      shift: e.evt.shiftKey,
      tolerance: PICK_PX / cam.scale,
    };
  };

  const startPan = (screen: Point) => {
    const c = store.getState().camera;
    pan.current = { from: screen, originX: c.originX, originY: c.originY };
  };

  return {
    onPointerDown: (e: Konva.KonvaEventObject<PointerEvent>) => {
      const i = info(e);
      (e.target.getStage()?.container() as HTMLElement | undefined)?.focus({ preventScroll: true });
      if (e.evt.button === 1 || space.current) {
        startPan(i.screen);
        return;
      }
      if (e.evt.button !== 0) return;
      if (controller.press(i) === 'pan') startPan(i.screen);
    },
    onPointerMove: (e: Konva.KonvaEventObject<PointerEvent>) => {
      const i = info(e);
      store.getState().setPointer(i.at);
      if (pan.current) {
        const p = pan.current;
        const c = store.getState().camera;
        store.getState().setCamera({
          scale: c.scale,
          originX: p.originX + i.screen[0] - p.from[0],
          originY: p.originY + i.screen[1] - p.from[1],
        });
        return;
      }
      controller.move(i);
    },
    onPointerUp: (e: Konva.KonvaEventObject<PointerEvent>) => {
      if (pan.current) {
        pan.current = null;
        return;
      }
      controller.release(info(e));
    },
    onDblClick: (e: Konva.KonvaEventObject<MouseEvent>) => controller.doubleClick(info(e)),
    onWheel: (e: Konva.KonvaEventObject<WheelEvent>) => {
      e.evt.preventDefault();
      const i = info(e);
      const factor = Math.exp(-e.evt.deltaY * 0.0015);
      store.getState().setCamera(zoomAt(store.getState().camera, i.screen, factor));
    },
    onPointerLeave: () => {
      if (pan.current) pan.current = null;
      store.getState().setHoverPoint(null);
      store.getState().setPointer(null);
    },
  };
}
