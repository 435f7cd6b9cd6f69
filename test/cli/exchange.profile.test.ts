// `exchange FILE --profile NAME` end to end. A convex black tube inside an
// isothermal black enclosure sees only the enclosure (a convex body does not
// see itself), so every arc absorbs sigma (T_w^4 - T_t^4) whatever the
// enclosure's shape: Incropera et al., Fundamentals of Heat and Mass Transfer,
// 6th ed., sec. 13.2 (blackbody exchange, summation rule).
import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { main } from '../../src/cli/main';
import type { CliIO } from '../../src/cli/io';
import { STEFAN_BOLTZMANN as SIGMA } from '../../src/core/exchange';

function run(file: unknown, ...args: string[]) {
  let out = '';
  let err = '';
  const io: CliIO = {
    out: (t) => void (out += t),
    err: (t) => void (err += t),
    readFile: () => JSON.stringify(file),
  };
  const code = main(['exchange', 'oven.json', ...args], io);
  return { code, out, err };
}

const arcs = Array.from({ length: 8 }, (_, k) => `tube 1 ${k + 1}`);
const oven = {
  version: 2,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [2, 0],
        [2, 1.5],
        [0, 1.5],
      ],
      surface: 'walls',
    },
    { kind: 'solid', circle: { center: [0.7, 0.6], radius: 0.1 }, surface: arcs },
  ],
  surfaces: {
    walls: { emissivity: 1, temperature: 1000 },
    ...Object.fromEntries(arcs.map((n) => [n, { emissivity: 1, temperature: 400 }])),
  },
};

describe('exchange --profile', () => {
  it('prints angle against net flux; a black tube in a black isothermal box absorbs the same all round', () => {
    const r = run(oven, '--profile', 'tube 1');
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const rows = Papa.parse<string[]>(r.out.trim()).data;
    expect(rows[0][0]).toBe('angle from +x anticlockwise (deg)');
    expect(rows.slice(1).map((row) => Number(row[0]))).toEqual([22.5, 67.5, 112.5, 157.5, 202.5, 247.5, 292.5, 337.5]);
    const expected = -SIGMA * (1000 ** 4 - 400 ** 4);
    for (const row of rows.slice(1)) expect(Math.abs(Number(row[3]) / expected - 1)).toBeLessThanOrEqual(1e-9);
  });

  it('refuses a name with no parts and --profile with --json', () => {
    const walls = run(oven, '--profile', 'walls');
    expect(walls.code).toBe(1);
    expect(walls.err).toMatch(/one piece/);
    expect(run(oven, '--profile', 'tube 1', '--json').code).toBe(2);
    expect(run(oven, '--profile').code).toBe(2);
  });
});
