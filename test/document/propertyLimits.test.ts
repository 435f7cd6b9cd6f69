// The documented input ranges (src/document/propertyLimits.ts, README "Limits
// of the heat-exchange inputs"): beyond them a value is refused with a message
// naming the field, the value and the limit; at them every output is finite;
// legal but unusual values are warned about.
import { describe, expect, it } from 'vitest';
import { restore } from '../../src/document';
import { main } from '../../src/cli/main';
import type { CliIO } from '../../src/cli/io';

const box = (surfaces: Record<string, unknown>, settings: Record<string, unknown> = {}) => ({
  version: 2,
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
      surface: ['floor', 'right', 'roof', 'left'],
    },
  ],
  surfaces,
  settings,
});

function refusal(doc: unknown): string {
  const r = restore(doc);
  if (r.ok) throw new Error('expected a refusal');
  expect(r.errors).toHaveLength(1);
  return r.errors[0].message;
}

function cli(doc: unknown, ...args: string[]): { code: number; out: string } {
  let out = '';
  const io: CliIO = { out: (t) => void (out += t), err: (t) => void (out += t), readFile: () => JSON.stringify(doc) };
  return { code: main(['exchange', 'f.json', ...args], io), out };
}

describe('inputs beyond their documented range are refused, naming field, value and limit', () => {
  // The values the fuzzer found to give NaN or Infinity before the ranges existed.
  it.each([
    [{ floor: { temperature: 1e80 } }, {}, "surface 'floor': temperature must be at most 10000 kelvin (got 1e+80)"],
    [{ floor: { heatFlux: 1e308 } }, {}, "surface 'floor': heatFlux must be at most 1000000000 W/m^2 (got 1e+308)"],
    [
      { floor: { emissivity: 5e-324 } },
      {},
      "surface 'floor': emissivity must be at least 0.001 (and at most 1) (got 5e-324)",
    ],
    [
      {},
      { surroundingsTemperature: 1e80 },
      'settings: surroundingsTemperature must be at most 10000 kelvin (got 1e+80)',
    ],
    [{}, { depth: 1e308 }, 'settings: depth must be at most 100000 metres (got 1e+308)'],
  ])('%j %j', (surfaces, settings, message) => {
    expect(refusal(box(surfaces, settings))).toBe(message);
  });

  it('the command line refuses them too, with the same message and exit 1', () => {
    const r = cli(box({ floor: { temperature: 1e80 } }));
    expect(r.code).toBe(1);
    expect(r.out).toContain('temperature must be at most 10000 kelvin (got 1e+80)');
  });
});

describe('at the limits every output is finite', () => {
  // The hottest, least emissive, largest flux and longest depth the ranges allow, together
  // (the wall given 1e9 W/m^2 settles near 14 000 K: a result, not an input, so not limited).
  const extreme = box(
    {
      floor: { emissivity: 0.001, temperature: 10000 },
      right: { emissivity: 1, heatFlux: 1e9 },
      roof: { emissivity: 0.001, heatFlux: -1e3 },
      left: { opening: true },
    },
    { surroundingsTemperature: 10000, depth: 1e5 },
  );

  it.each([[], ['--json'], ['--csv']])('exchange %j', (...args: string[]) => {
    const r = cli(extreme, ...args);
    expect(r.code).toBe(0);
    expect(r.out).not.toMatch(/NaN|Infinity|\bnull\b|undefined/);
    if (args[0] === '--json') {
      const numbers = r.out.match(/-?\d+(\.\d+)?(e[-+]?\d+)?/g) ?? [];
      expect(numbers.length).toBeGreaterThan(10);
      for (const n of numbers) expect(Number.isFinite(Number(n))).toBe(true);
    }
  });
});

describe('legal but unusual values are warned about', () => {
  it('a temperature above 3000 K and an emissivity below 0.02', () => {
    const r = restore(box({ floor: { temperature: 3500, emissivity: 0.01 } }, { gasTemperature: 3100 }));
    if (!r.ok) throw new Error(r.errors[0].message);
    expect(r.warnings).toEqual([
      "surface 'floor' temperature: 3500 K is above 3000 K, unusual for furnace work; check the value and its unit",
      "surface 'floor' emissivity: 0.01 is below 0.02, lower than polished silver or gold; check the value",
      'settings.gasTemperature: 3100 K is above 3000 K, unusual for furnace work; check the value and its unit',
    ]);
  });

  it('ordinary furnace values give no warning', () => {
    const r = restore(box({ floor: { temperature: 1500, emissivity: 0.85 } }, { surroundingsTemperature: 300 }));
    expect(r.ok && r.warnings).toEqual([]);
  });
});
