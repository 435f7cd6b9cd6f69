import { useEffect, useMemo, useRef } from 'react';
import { Stage } from 'react-konva';
import { useApp, useAppStore } from '../AppContext';
import {
  selectCamera,
  selectDrawnDoc,
  selectDraft,
  selectFitRequest,
  selectHoverPair,
  selectHoverPoint,
  selectSelection,
  selectTool,
} from '../../state/selectors';
import type { AppState } from '../../state/store';
import { fitCamera } from '../../state/camera';
import { sketchBounds } from '../../state/geometry/polygon';
import { toolRegistry } from '../../state/tools/registry';
import { useElementSize } from './useElementSize';
import { usePointerRouting } from './usePointerRouting';
import { useSelectedSurfaces } from './useSelectedSurfaces';
import { useSurfaceColours } from './useSurfaceColours';
import { canvasProblemMarks, canvasProblems } from './problems';
import { GridLayer } from './GridLayer';
import { ShapesLayer } from './ShapesLayer';
import { liveShift, shapeLayers, useLiveShapes } from './liveShapes';
import { HandlesLayer } from './HandlesLayer';
import { DraftLayer } from './DraftLayer';
import { NamesLayer } from './NamesLayer';
import { ProblemLayer } from './ProblemLayer';
import { HeatLayer } from '../exchange/HeatLayer';
import { HeatLegend } from '../exchange/HeatLegend';

const selectGridStep = (s: AppState) => s.gridStep;
const selectSetCamera = (s: AppState) => s.setCamera;
const selectShowNames = (s: AppState) => s.showNames;
const selectGestureShapes = (s: AppState) => s.gestureBase?.shapes ?? null;
const selectCanvasProblems = (s: AppState) => canvasProblems(s.viewFactors);

export function SketchCanvas() {
  const { ref, width, height } = useElementSize<HTMLDivElement>();
  const doc = useApp(selectDrawnDoc);
  const camera = useApp(selectCamera);
  const tool = useApp(selectTool);
  const selection = useApp(selectSelection);
  const draft = useApp(selectDraft);
  const hover = useApp(selectHoverPoint);
  const hoverPair = useApp(selectHoverPair);
  const gridStep = useApp(selectGridStep);
  const fitRequest = useApp(selectFitRequest);
  const setCamera = useApp(selectSetCamera);
  const showNames = useApp(selectShowNames);
  const store = useAppStore();
  const resultProblems = useApp(selectCanvasProblems);
  const selected = useSelectedSurfaces();
  const handlers = usePointerRouting();
  const baseShapes = useApp(selectGestureShapes);
  const live = useLiveShapes(doc.shapes, baseShapes);
  const layers = shapeLayers(doc.shapes, live);
  // During a gesture the still names depend only on shapes the gesture leaves alone, so
  // they are laid out from its start, once. Live shapes moved whole: their names too,
  // shifted as one group.
  const startShapes = baseShapes?.length === doc.shapes.length ? baseShapes : null;
  const shift = useMemo(() => liveShift(doc.shapes, startShapes, live), [doc.shapes, startShapes, live]);

  const order = useSurfaceColours();
  const emphasis = useMemo(() => new Set([...(hoverPair ?? []), ...selected]), [hoverPair, selected]);
  const problems = useMemo(() => canvasProblemMarks(resultProblems, doc.shapes), [resultProblems, doc.shapes]);

  // Fit once per request (F, the Fit button, a file opened) and on each layout
  // from zero size; not on resizes or edits, so it reads the document from the store.
  const fitted = useRef<number | null>(null);
  useEffect(() => {
    if (width <= 0 || height <= 0) {
      fitted.current = null;
      return;
    }
    if (fitted.current === fitRequest) return;
    fitted.current = fitRequest;
    setCamera(fitCamera(sketchBounds(store.getState().doc.shapes), width, height));
  }, [width, height, fitRequest, setCamera, store]);

  const active = toolRegistry.get(tool);
  return (
    <div
      ref={ref}
      className="canvas-box"
      tabIndex={0}
      aria-label="Sketch canvas: draw with the mouse; the side panel edits the same sketch numerically"
      style={{ cursor: active.cursor }}
    >
      {width > 0 && height > 0 && (
        <Stage width={width} height={height} {...handlers}>
          <GridLayer camera={camera} width={width} height={height} step={gridStep} />
          {layers.map((draw) => (
            <ShapesLayer
              key={draw.key}
              shapes={doc.shapes}
              draw={draw.shapes}
              camera={camera}
              order={order}
              emphasis={emphasis}
              problemShapes={problems.shapes}
            />
          ))}
          {[false, true].map((side) => (
            <HeatLayer
              key={side ? 'heat-live' : 'heat'}
              shapes={doc.shapes}
              camera={camera}
              live={live}
              liveSide={side}
            />
          ))}
          {showNames &&
            [false, true].map(
              (side) =>
                (!side || live.size > 0) && (
                  <NamesLayer
                    key={side ? 'live' : 'still'}
                    shapes={startShapes && (shift || !side) ? startShapes : doc.shapes}
                    shift={side ? shift : null}
                    camera={camera}
                    colours={order}
                    emphasis={emphasis}
                    live={live}
                    liveSide={side}
                  />
                ),
            )}
          <HandlesLayer doc={doc} camera={camera} selection={selection} showAll={active.showsAllHandles ?? false} />
          <DraftLayer tool={tool} draft={draft} hover={hover} camera={camera} />
          <ProblemLayer marks={problems} camera={camera} />
        </Stage>
      )}
      <HeatLegend />
    </div>
  );
}
