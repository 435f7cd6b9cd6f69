// The 1012-edge sketch of the drag benchmarks (browser.ts, dragStep.ts): a 10 x 4
// furnace box of 52 wall edges holding 20 tubes drawn as 48-gons, either one surface
// per tube and per wall (24 surfaces) or every edge its own surface.
import type { SketchFile } from '../../src/state/sketchFile';
import { bankScene, FURNACE_BOX, FURNACE_TUBE_RADIUS, FURNACE_TUBES, furnaceTubeCentre } from './scenes';

const WALL_PER_SIDE = 13;
const SIDES = 48;
const RADIUS = 0.25;
/** Tube centres: 5 columns by 4 rows, 1.5 apart sideways so a drag of ±0.3 never touches a neighbour. */
const CENTRES = [1, 3, 5, 7, 9].flatMap((x) => [0.5, 1.5, 2.5, 3.5].map((y) => [x, y] as const));

/** The 1012-edge sketch: `perEdge`, every edge its own surface; else one surface per tube and per wall. */
export function bigSketch(perEdge: boolean): SketchFile {
  const corners = [
    [0, 0],
    [10, 0],
    [10, 4],
    [0, 4],
  ];
  const wall: [number, number][] = [];
  for (let c = 0; c < 4; c++) {
    const [x0, y0] = corners[c];
    const [x1, y1] = corners[(c + 1) % 4];
    for (let k = 0; k < WALL_PER_SIDE; k++)
      wall.push([x0 + ((x1 - x0) * k) / WALL_PER_SIDE, y0 + ((y1 - y0) * k) / WALL_PER_SIDE]);
  }
  const tubes = CENTRES.map(([cx, cy], t) => ({
    kind: 'solid' as const,
    points: Array.from({ length: SIDES }, (_, k): [number, number] => {
      const a = (2 * Math.PI * k) / SIDES;
      return [cx + RADIUS * Math.cos(a), cy + RADIUS * Math.sin(a)];
    }),
    surface: perEdge ? Array.from({ length: SIDES }, (_, k) => `tube ${t + 1}.${k + 1}`) : `tube ${t + 1}`,
  }));
  return {
    version: 2,
    units: 'm',
    shapes: [
      {
        kind: 'enclosure',
        points: wall,
        surface: wall.map((_, k) =>
          perEdge ? `wall ${k + 1}` : ['floor', 'right', 'roof', 'left'][Math.floor(k / WALL_PER_SIDE)],
        ),
      },
      ...tubes,
    ],
  };
}

/**
 * The furnace section of `npm run bench` (scenes.ts, furnaceScene) as a sketch file: one
 * surface per wall and per exact tube. The bench drags tube 26 (centre 6.12, 3.8) by up to 0.05 either way.
 */
export function furnaceSketch(): SketchFile {
  const box: [number, number][] = [];
  for (let k = 0; k < FURNACE_BOX.length; k += 2) box.push([FURNACE_BOX[k], FURNACE_BOX[k + 1]]);
  return {
    version: 2,
    units: 'm',
    shapes: [
      { kind: 'enclosure', points: box, surface: ['floor', 'right', 'roof', 'left'] },
      ...Array.from({ length: FURNACE_TUBES }, (_, k) => ({
        kind: 'solid' as const,
        points: [],
        circle: { center: furnaceTubeCentre(k), radius: FURNACE_TUBE_RADIUS },
        surface: `tube ${k + 1}`,
      })),
    ],
  };
}

/**
 * The deep tube bank of `npm run bench` (scenes.ts, bankScene(4)) as a sketch file: four
 * staggered rows of 25 exact tubes, one surface per wall and per tube. The browser bench
 * drags the 13th tube of the second row.
 */
export function deepBankSketch(): SketchFile {
  const box: [number, number][] = [];
  for (let k = 0; k < FURNACE_BOX.length; k += 2) box.push([FURNACE_BOX[k], FURNACE_BOX[k + 1]]);
  const circles = bankScene(4).circles!;
  return {
    version: 2,
    units: 'm',
    shapes: [
      { kind: 'enclosure', points: box, surface: ['floor', 'right', 'roof', 'left'] },
      ...circles.map((c, k) => ({
        kind: 'solid' as const,
        points: [],
        circle: { center: [c.cx, c.cy] as [number, number], radius: c.radius },
        surface: `tube ${k + 1}`,
      })),
    ],
  };
}

/** The 1012-edge sketch (24 surfaces) with a hot floor, cooler tubes and reradiating other walls. */
export function studySketch(): SketchFile {
  const file = bigSketch(false);
  const surfaces: NonNullable<SketchFile['surfaces']> = {
    floor: { emissivity: 0.85, temperature: 1400 },
    roof: { emissivity: 0.7, adiabatic: true },
    left: { emissivity: 0.7, adiabatic: true },
    right: { emissivity: 0.7, adiabatic: true },
  };
  for (let t = 1; t <= 20; t++) surfaces[`tube ${t}`] = { emissivity: 0.8, temperature: 600 + 10 * t };
  return { ...file, surfaces };
}
