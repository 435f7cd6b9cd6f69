import { memo, useLayoutEffect, useMemo, useRef } from 'react';
import Konva from 'konva';
import { Group, Layer, Text } from 'react-konva';
import type { Camera } from '../../state/viewSlice';
import type { Shape } from '../../state/sketchFile';
import { edgeEnds } from '../../state/geometry/polygon';
import { shapeGeometry } from '../../state/geometry/shapeGeometry';
import { toScreen } from '../../state/camera';
import { surfaceStyle } from '../palette';
import { arcAngles, isCircle, rimPoint } from '../../state/edits/circleShapes';

interface Props {
  shapes: readonly Shape[];
  camera: Camera;
  colours: ReadonlyMap<string, number>;
  emphasis: Set<string>;
  /** Shapes a gesture is changing now; their surfaces' names go in a layer of their own. */
  live: ReadonlySet<number>;
  /** Draw the names of surfaces on live shapes (true) or of the others (false). */
  liveSide: boolean;
  /**
   * Live shapes moved whole by this much (sketch units) since `shapes`, which are then
   * the gesture's start: the names are laid out once and the group moves (liveShift).
   */
  shift?: readonly [number, number] | null;
}

/** Label box width, px; the text is centred in it. */
const BOX = 180;
/** Distance of a label from its edge, px, on the radiating side. */
const GAP = 14;

/** Each surface's name once, beside the middle of its longest edge on the side that radiates. */
export const NamesLayer = memo(function NamesLayer(props: Props) {
  const { shapes, camera, colours, emphasis, live, liveSide, shift } = props;
  const labels = useMemo(
    () => layOut(shapes, camera, colours, emphasis, live, liveSide),
    [shapes, camera, colours, emphasis, live, liveSide],
  );
  return (
    <Layer listening={false}>
      <Group x={shift ? shift[0] * camera.scale : 0} y={shift ? -shift[1] * camera.scale : 0}>
        {labels}
      </Group>
    </Layer>
  );
});

/** The labels of one side, placed for `shapes`. */
function layOut(
  shapes: readonly Shape[],
  camera: Camera,
  colours: ReadonlyMap<string, number>,
  emphasis: Set<string>,
  live: ReadonlySet<number>,
  liveSide: boolean,
) {
  // The longest piece of each name over all shapes, the first one on a tie (per-shape parts are cached).
  const best = new Map<string, { shape: number; edge: number; length: number }>();
  const onLive = new Set<string>();
  shapes.forEach((shape, s) => {
    const g = shapeGeometry(shape);
    for (const [name, piece] of g.longest) {
      const b = best.get(name);
      if (!b || piece.length > b.length) best.set(name, { shape: s, edge: piece.edge, length: piece.length });
    }
    if (live.has(s)) for (const name of g.longest.keys()) onLive.add(name);
  });
  const labels = [];
  for (const [name, b] of best) {
    if (onLive.has(name) !== liveSide) continue;
    const [x, y, nx, ny] = labelPlace(shapes[b.shape], b.edge, camera);
    labels.push(
      <Name
        key={name}
        name={name}
        x={x + nx * GAP - BOX / 2}
        y={y - ny * GAP - 7}
        colour={surfaceStyle(colours.get(name) ?? 0).colour}
        bold={emphasis.has(name)}
        cached={liveSide}
      />,
    );
  }
  return labels;
}

/** Screen point beside which a label sits and the sketch-space direction it is pushed (x, y, nx, ny). */
function labelPlace(shape: Shape, edge: number, camera: Camera): [number, number, number, number] {
  if (isCircle(shape)) {
    // A circle's name sits beside the middle of its longest arc (above a one-surface tube).
    const [a0, a1] = typeof shape.surface === 'string' ? [Math.PI / 2, Math.PI / 2] : arcAngles(shape, edge);
    const mid = (a0 + a1) / 2;
    const out = shape.kind === 'solid' ? 1 : -1;
    const [x, y] = toScreen(camera, rimPoint(shape, mid));
    return [x, y, out * Math.cos(mid), out * Math.sin(mid)];
  }
  if (shape.kind === 'solid' && typeof shape.surface === 'string') {
    // A body that is one surface (a tube): centred above it, so names in a row do not run together.
    let minX = Infinity;
    let maxX = -Infinity;
    let top = -Infinity;
    for (const [px, py] of shape.points) {
      minX = Math.min(minX, px);
      maxX = Math.max(maxX, px);
      top = Math.max(top, py);
    }
    const [x, y] = toScreen(camera, [(minX + maxX) / 2, top]);
    return [x, y, 0, 1];
  }
  const [a, c] = edgeEnds(shape, edge);
  const [x, y] = toScreen(camera, [(a[0] + c[0]) / 2, (a[1] + c[1]) / 2]);
  const { normals } = shapeGeometry(shape);
  return [x, y, normals[2 * edge], normals[2 * edge + 1]];
}

/**
 * One label; unchanged labels skip rendering. A label of a shape that follows the
 * pointer (`cached`) is drawn once into a bitmap that then only moves: its text is
 * drawn twice (white halo, then colour), which cost every frame of a drag.
 */
const Name = memo(function Name(p: {
  name: string;
  x: number;
  y: number;
  colour: string;
  bold: boolean;
  cached: boolean;
}) {
  const ref = useRef<Konva.Text>(null);
  useLayoutEffect(() => {
    const node = ref.current;
    if (!node || !p.cached) return;
    node.cache({ pixelRatio: Konva.pixelRatio });
    return () => {
      node.clearCache();
    };
  }, [p.cached, p.name, p.colour, p.bold]);
  return (
    <Text
      ref={ref}
      text={p.name}
      x={p.x}
      y={p.y}
      width={BOX}
      align="center"
      fontSize={12}
      fontStyle={p.bold ? 'bold' : 'normal'}
      fontFamily="system-ui, sans-serif"
      fill={p.colour}
      stroke="#ffffff"
      strokeWidth={3}
      fillAfterStrokeEnabled
      wrap="none"
      ellipsis
      listening={false}
    />
  );
});
