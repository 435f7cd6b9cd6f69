// The command line end to end: sketch file -> view factors -> exchange -> output.
// Physics checks name their source; the chain is exact to rounding (1e-9).
import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { STEFAN_BOLTZMANN as SIGMA } from '../../src/core/exchange';
import { run, json, regular, close } from './exchangeHelpers';

describe('exchange FILE --json: physics through the whole chain', () => {
  it('a hexagonal tube inside a hexagonal duct (two-surface enclosure, convex inner body), drawn in mm', () => {
    // Similar concentric polygons: F12 = 1, A1/A2 = r1/r2, so the long concentric cylinders form is exact:
    // q = sigma A1 (T1^4 - T2^4) / (1/e1 + (1-e2)/e2 (A1/A2)) (Incropera et al., 6th ed., Table 13.3;
    // the two-surface enclosure of sec. 13.3.3 with F12 = 1).
    const [r1, r2] = [60, 250]; // mm, circumradius
    const file = {
      version: 1,
      units: 'mm',
      shapes: [
        { kind: 'enclosure', points: regular(6, r2), surface: 'duct' },
        { kind: 'solid', points: regular(6, r1, 0.3), surface: 'tube' },
      ],
      surfaces: { tube: { emissivity: 0.8, temperature: 900 }, duct: { emissivity: 0.4, temperature: 350 } },
    };
    const j = json({ 'hex.json': file }, 'hex.json');
    const names = j.surfaces.map((s: { name: string }) => s.name);
    expect(names).toEqual(['duct', 'tube']);
    const [duct, tube] = j.surfaces;
    close(tube.length, 6 * r1); // side of a regular hexagon = circumradius; reported in file units
    const A1 = (6 * r1) / 1000; // m per m of depth
    const q = (SIGMA * A1 * (900 ** 4 - 350 ** 4)) / (1 / 0.8 + ((1 - 0.4) / 0.4) * (r1 / r2));
    close(tube.netHeat, q);
    close(duct.netHeat, -q);
    close(tube.netFlux, q / A1);
    close(j.exchange[1][0], q);
    // Energy balance summed here from the printed net heats (closed enclosure: what the tube gives off the duct takes up).
    expect(Math.abs(tube.netHeat + duct.netHeat)).toBeLessThanOrEqual(1e-12 * q);
    expect(j.energyBalance).toBeLessThan(1e-12);
  });

  it('a triangular duct with a reradiating side, and its temperature', () => {
    // Three-surface enclosure with a reradiating surface (Incropera et al., 6th ed., sec. 13.3.4, eq. 13.30,
    // number from memory), F_ij = (L_i + L_j - L_k)/(2 L_i) (Incropera, Table 13.1, three-sided enclosure).
    const L = [3, 4, 5];
    const file = {
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [3, 0],
            [3, 4],
          ],
          surface: ['a', 'b', 'r'],
        },
      ],
      surfaces: {
        a: { emissivity: 0.7, temperature: 1000 },
        b: { emissivity: 0.4, temperature: 500 },
        r: { adiabatic: true },
      },
    };
    const f = (i: number, j: number) => (L[i] + L[j] - L[3 - i - j]) / (2 * L[i]);
    const E1 = SIGMA * 1000 ** 4;
    const E2 = SIGMA * 500 ** 4;
    const R1 = 0.3 / (0.7 * 3);
    const R2 = 0.6 / (0.4 * 4);
    const q = (E1 - E2) / (R1 + 1 / (3 * f(0, 1) + 1 / (1 / (3 * f(0, 2)) + 1 / (4 * f(1, 2)))) + R2);
    const J1 = E1 - q * R1;
    const J2 = E2 + q * R2;
    const JR = (3 * f(0, 2) * J1 + 4 * f(1, 2) * J2) / (3 * f(0, 2) + 4 * f(1, 2));
    const j = json({ 't.json': file }, 't.json');
    close(j.surfaces[0].netHeat, q);
    close(j.surfaces[1].netHeat, -q);
    expect(j.surfaces[2].netHeat).toBe(0);
    close(j.surfaces[2].temperature, (JR / SIGMA) ** 0.25);
    expect(j.surfaces[2].emissivity).toBe(0.9); // default for a surface without one
  });

  it('a wide flat duct: exact for its geometry, and within H/W of infinite parallel plates', () => {
    // Directly opposed strips, F12 = sqrt(1 + (H/W)^2) - H/W (Incropera, Table 13.1, parallel plates with
    // midlines connected by a perpendicular); ends reradiating, so eq. 13.30 as above. As H/W -> 0 the
    // infinite-plates form q" = sigma (T1^4 - T2^4)/(1/e1 + 1/e2 - 1) (Table 13.3) is approached; the ends
    // change q by about (H/W)/2 for black plates and less for gray ones, so H/W bounds the difference.
    const [W, H] = [20, 0.02];
    const [e1, e2, T1, T2] = [0.6, 0.3, 800, 400];
    const file = {
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [W, 0],
            [W, H],
            [0, H],
          ],
          surface: ['bottom', 'ends', 'top', 'ends'],
        },
      ],
      surfaces: {
        bottom: { emissivity: e1, temperature: T1 },
        top: { emissivity: e2, temperature: T2 },
        ends: { adiabatic: true },
      },
    };
    const j = json({ 'w.json': file }, 'w.json');
    const [bottom] = j.surfaces;
    const h = H / W;
    const F12 = Math.sqrt(1 + h * h) - h;
    const F1R = 1 - F12; // both ends together
    const A = W;
    const AR = 2 * H;
    const FR1 = (A * F1R) / AR;
    expect(FR1).toBeGreaterThan(0);
    const R1 = (1 - e1) / (e1 * A);
    const R2 = (1 - e2) / (e2 * A);
    const E1 = SIGMA * T1 ** 4;
    const E2 = SIGMA * T2 ** 4;
    const q = (E1 - E2) / (R1 + 1 / (A * F12 + 1 / (2 / (A * F1R))) + R2);
    close(bottom.netHeat, q);
    const qInfinite = (SIGMA * (T1 ** 4 - T2 ** 4)) / (1 / e1 + 1 / e2 - 1);
    expect(Math.abs(bottom.netFlux / qInfinite - 1)).toBeLessThan(h);
  });

  it('a bar alone in open space: q = e sigma A (T^4 - Ts^4), the surroundings reported', () => {
    // Small convex object in large surroundings (Incropera et al., 6th ed., Table 13.3; eq. 1.7).
    const file = {
      version: 1,
      units: 'cm',
      shapes: [
        {
          kind: 'solid',
          points: [
            [0, 0],
            [10, 0],
            [10, 5],
            [0, 5],
          ],
          surface: 'bar',
        },
      ],
      surfaces: { bar: { emissivity: 0.55, temperature: 700 } },
      settings: { surroundingsTemperature: 295 },
    };
    const j = json({ 'bar.json': file }, 'bar.json');
    const q = 0.55 * SIGMA * 0.3 * (700 ** 4 - 295 ** 4);
    close(j.surfaces[0].netHeat, q);
    const surroundings = j.surroundings;
    if (!surroundings) throw new Error('an open sketch reports its surroundings');
    close(surroundings.viewFactors[0], 1);
    close(surroundings.netHeat, -q);
    expect(surroundings.temperature).toBe(295);
    close(surroundings.exchange[0], q);
  });

  it('an opening in a black isothermal cavity passes A sigma (T^4 - Ts^4) (common practice: a black cavity emits as a blackbody)', () => {
    const file = {
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [1, 0],
            [1, 0.6],
            [0.5, 1.2],
            [0, 0.6],
          ],
          surface: ['floor', 'wall', 'mouth', 'wall', 'wall'],
        },
      ],
      surfaces: {
        floor: { emissivity: 1, temperature: 1000 },
        wall: { emissivity: 1, temperature: 1000 },
        mouth: { opening: true },
      },
      settings: { surroundingsTemperature: 300 },
    };
    const j = json({ 'c.json': file }, 'c.json');
    const mouth = j.surfaces.find((s) => s.name === 'mouth');
    if (!mouth) throw new Error('the mouth is a surface of the output');
    // The mouth runs from (1, 0.6) to (0.5, 1.2) m (the file above): its length from the points, not the output.
    const width = Math.hypot(0.5, 0.6);
    close(mouth.length, width);
    close(mouth.netHeat, width * SIGMA * (300 ** 4 - 1000 ** 4));
    expect(mouth.temperature).toBe(300);
    expect(mouth.emissivity).toBe(1);
    expect(j.surroundings).toBeUndefined(); // closed sketch: the opening is a surface of the matrix
  });
});

describe('exchange FILE --csv: every cell against closed forms, not against another writer', () => {
  const rowsOf = (out: string) => Papa.parse<string[]>(out, { newline: '\r\n', skipEmptyLines: true }).data;

  it('a triangular duct with a reradiating side, with a depth', () => {
    // Incropera et al., 6th ed., sec. 13.3.4, eq. 13.30 (reradiating surface; number from memory) and Table 13.1 (three-sided enclosure), as above.
    const L = [3, 4, 5];
    const file = {
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [3, 0],
            [3, 4],
          ],
          surface: ['a', 'b', 'r'],
        },
      ],
      surfaces: {
        a: { emissivity: 0.7, temperature: 1000 },
        b: { emissivity: 0.4, temperature: 500 },
        r: { adiabatic: true },
      },
    };
    const f = (i: number, j: number) => (L[i] + L[j] - L[3 - i - j]) / (2 * L[i]);
    const E1 = SIGMA * 1000 ** 4;
    const E2 = SIGMA * 500 ** 4;
    const R1 = 0.3 / (0.7 * 3);
    const R2 = 0.6 / (0.4 * 4);
    const q = (E1 - E2) / (R1 + 1 / (3 * f(0, 1) + 1 / (1 / (3 * f(0, 2)) + 1 / (4 * f(1, 2)))) + R2);
    const J1 = E1 - q * R1;
    const J2 = E2 + q * R2;
    const JR = (3 * f(0, 2) * J1 + 4 * f(1, 2) * J2) / (3 * f(0, 2) + 4 * f(1, 2));
    const r = run({ 't.json': file }, 't.json', '--csv', '--depth', '2');
    expect(r.code).toBe(0);
    const rows = rowsOf(r.out);
    expect(rows[0]).toEqual([
      'surface',
      'length (m)',
      'emissivity',
      'condition',
      'temperature (K)',
      'net heat (W/m)',
      'net flux (W/m^2)',
      'radiosity (W/m^2)',
      'convection heat (W/m)',
      'supplied heat (W/m)',
      'net heat total (W) over 2 m',
    ]);
    expect(rows.slice(1).map((row) => row.slice(0, 4))).toEqual([
      ['a', '3', '0.7', 'temperature'],
      ['b', '4', '0.4', 'temperature'],
      ['r', '5', '0.9', 'adiabatic'],
    ]);
    // T, net heat, net flux, radiosity, convection (none: 0), supplied (= net heat without convection), total.
    const expected = [
      [1000, q, q / 3, J1, 0, q, 2 * q],
      [500, -q, -q / 4, J2, 0, -q, -2 * q],
      [(JR / SIGMA) ** 0.25, 0, 0, JR, 0, 0, 0],
    ];
    expected.forEach((values, i) => {
      const cells = rows[i + 1].slice(4).map(Number);
      values.forEach((v, k) => (v === 0 ? expect(Math.abs(cells[k])).toBeLessThan(1e-9 * q) : close(cells[k], v)));
    });
    expect(rows).toHaveLength(4); // closed: no surroundings row
  });

  it('a bar alone in open space: its row and the surroundings row', () => {
    // Small convex object in large surroundings (Incropera et al., 6th ed., Table 13.3; eq. 1.7): q = e sigma A (T^4 - Ts^4);
    // it sees only the black surroundings, so G = sigma Ts^4 and J = e sigma T^4 + (1 - e) G.
    const file = {
      version: 1,
      units: 'cm',
      shapes: [
        {
          kind: 'solid',
          points: [
            [0, 0],
            [10, 0],
            [10, 5],
            [0, 5],
          ],
          surface: 'bar',
        },
      ],
      surfaces: { bar: { emissivity: 0.55, temperature: 700 } },
      settings: { surroundingsTemperature: 295 },
    };
    const A = 0.3; // m per m of depth
    const q = 0.55 * SIGMA * A * (700 ** 4 - 295 ** 4);
    const r = run({ 'bar.json': file }, 'bar.json', '--csv');
    expect(r.code).toBe(0);
    const rows = rowsOf(r.out);
    expect(rows[0]).toEqual([
      'surface',
      'length (cm)',
      'emissivity',
      'condition',
      'temperature (K)',
      'net heat (W/m)',
      'net flux (W/m^2)',
      'radiosity (W/m^2)',
      'convection heat (W/m)',
      'supplied heat (W/m)',
    ]);
    expect(rows[1].slice(0, 5)).toEqual(['bar', '30', '0.55', 'temperature', '700']);
    close(Number(rows[1][5]), q);
    close(Number(rows[1][6]), q / A);
    close(Number(rows[1][7]), 0.55 * SIGMA * 700 ** 4 + 0.45 * SIGMA * 295 ** 4);
    // The surroundings: named and labelled as in the table, black at 295 K, taking up what the bar gives off.
    expect(rows[2].slice(0, 5)).toEqual(['(surroundings)', '', '1', 'black', '295']);
    close(Number(rows[2][5]), -q);
    expect(rows[2][6]).toBe('');
    close(Number(rows[2][7]), SIGMA * 295 ** 4);
    expect(rows).toHaveLength(3);
    // The default table names the surroundings row the same way.
    expect(run({ 'bar.json': file }, 'bar.json').out).toMatch(/^ {2}\(surroundings\) +1 +black +295\.00 /m);
  });
});
