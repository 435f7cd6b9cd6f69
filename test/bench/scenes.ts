import type { SceneInput } from '../../src/core/scene';

/** Small seeded PRNG (mulberry32), so every run measures the same scenes. */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * A rectangular furnace section (wallEdges edges) holding `tubes` regular polygons
 * of `sides` sides at random, non-touching positions. Every edge is its own surface.
 */
export function tubeScene(seed: number, tubes: number, sides: number, wallEdges: number): SceneInput {
  const rand = mulberry32(seed);
  const W = 10,
    H = 4;
  const per = Math.max(1, Math.round(wallEdges / 4));
  const wall: number[] = [];
  const corners = [
    [0, 0],
    [W, 0],
    [W, H],
    [0, H],
  ];
  for (let c = 0; c < 4; c++) {
    const [x0, y0] = corners[c];
    const [x1, y1] = corners[(c + 1) % 4];
    for (let k = 0; k < per; k++) wall.push(x0 + ((x1 - x0) * k) / per, y0 + ((y1 - y0) * k) / per);
  }
  const polygons: SceneInput['polygons'] = [{ kind: 'enclosure', points: wall }];
  const placed: [number, number, number][] = [];
  let guard = 0;
  while (placed.length < tubes && guard++ < 100000) {
    const r = 0.15 + 0.2 * rand();
    const cx = r + 0.1 + rand() * (W - 2 * r - 0.2);
    const cy = r + 0.1 + rand() * (H - 2 * r - 0.2);
    if (placed.some(([x, y, q]) => Math.hypot(x - cx, y - cy) < r + q + 0.05)) continue;
    placed.push([cx, cy, r]);
    const pts: number[] = [];
    const phase = rand() * Math.PI;
    for (let k = 0; k < sides; k++) {
      const a = phase + (2 * Math.PI * k) / sides;
      pts.push(cx + r * Math.cos(a), cy + r * Math.sin(a));
    }
    polygons.push({ kind: 'solid', points: pts });
  }
  const count = polygons.reduce((n, p) => n + p.points.length / 2, 0);
  return { polygons, edgeSurface: Array.from({ length: count }, (_, k) => k), surfaceCount: count };
}

/** The furnace section's box (flat x, y, anticlockwise), its tubes and their radius, sketch units (m). */
export const FURNACE_BOX: readonly number[] = [0, 0, 12, 0, 12, 4, 0, 4];
export const FURNACE_TUBES = 50;
export const FURNACE_TUBE_RADIUS = 0.06;

/** Centre of the furnace section's tube k (0-based): pitch 0.24 along y = 3.8. */
export function furnaceTubeCentre(k: number): [number, number] {
  return [0.12 + 0.24 * k, 3.8];
}

/**
 * A furnace section: a 12 x 4 box with one row of 50 tubes (diameter 0.12, pitch 0.24,
 * centre line 0.2 below the top wall, as in a wall-fired heater). Tubes are exact
 * circles (`sides` = 0) or regular polygons of `sides` sides, one surface per tube;
 * the four walls are a surface each.
 */
export function furnaceScene(sides: number): SceneInput {
  const polygons: SceneInput['polygons'] = [{ kind: 'enclosure', points: [...FURNACE_BOX] }];
  const circles: NonNullable<SceneInput['circles']> = [];
  const edgeSurface = [0, 1, 2, 3];
  const r = FURNACE_TUBE_RADIUS;
  for (let k = 0; k < FURNACE_TUBES; k++) {
    const [cx, cy] = furnaceTubeCentre(k);
    if (sides === 0) {
      circles.push({ kind: 'solid', cx, cy, radius: r, arcs: 1 });
      edgeSurface.push(4 + k);
      continue;
    }
    const pts: number[] = [];
    for (let m = 0; m < sides; m++)
      pts.push(cx + r * Math.cos((2 * Math.PI * m) / sides), cy + r * Math.sin((2 * Math.PI * m) / sides));
    polygons.push({ kind: 'solid', points: pts });
    for (let m = 0; m < sides; m++) edgeSurface.push(4 + k);
  }
  return { polygons, circles, edgeSurface, surfaceCount: 54 };
}

/**
 * A tube bank: the furnace box with `rows` staggered rows of 25 exact tubes (diameter
 * 0.12, pitch 0.46 along each row, rows 0.2 apart and shifted half a pitch), one
 * surface per tube and per wall. Tubes there see one another past several others.
 * (At a pitch of 0.48 the last tube of the second row crossed the right wall, a
 * sketch the app refuses: test/bench/scenes.test.ts checks every bench scene.)
 */
export function bankScene(rows = 2): SceneInput {
  const circles: NonNullable<SceneInput['circles']> = [];
  for (let row = 0; row < rows; row++)
    for (let k = 0; k < 25; k++)
      circles.push({
        kind: 'solid',
        cx: 0.3 + 0.23 * (row % 2) + 0.46 * k,
        cy: 3.8 - 0.2 * row,
        radius: FURNACE_TUBE_RADIUS,
        arcs: 1,
      });
  return {
    polygons: [{ kind: 'enclosure', points: [...FURNACE_BOX] }],
    circles,
    edgeSurface: Array.from({ length: 4 + circles.length }, (_, k) => k),
    surfaceCount: 4 + circles.length,
  };
}
