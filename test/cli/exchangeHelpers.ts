import { expect } from 'vitest';
import { main } from '../../src/cli/main';
import type { CliIO } from '../../src/cli/io';

// Shared by the exchange command's tests (exchange.test.ts, exchange.more.test.ts).
export const REL = 1e-9;

export function run(files: Record<string, unknown>, ...args: string[]) {
  let out = '';
  let err = '';
  const io: CliIO = {
    out: (t) => void (out += t),
    err: (t) => void (err += t),
    readFile: (path) => {
      if (!(path in files)) throw Object.assign(new Error('nope'), { code: 'ENOENT' });
      const f = files[path];
      return typeof f === 'string' ? f : JSON.stringify(f);
    },
  };
  const code = main(['exchange', ...args], io);
  return { code, out, err };
}

/** What `exchange FILE --json` prints (README, "The command line"). */
export interface ExchangeJson {
  surfaces: {
    name: string;
    length: number;
    emissivity: number;
    temperature: number;
    netHeat: number;
    netFlux: number;
    radiosity: number;
    netHeatTotal?: number;
  }[];
  exchange: number[][];
  energyBalance: number;
  depth?: number;
  surroundings?: { viewFactors: number[]; netHeat: number; temperature: number; exchange: number[] };
}

export function json(files: Record<string, unknown>, ...args: string[]): ExchangeJson {
  const r = run(files, ...args, '--json');
  expect(r.err).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.out) as ExchangeJson;
}

export type Pt = [number, number];
export const regular = (sides: number, radius: number, phase = 0): Pt[] =>
  Array.from({ length: sides }, (_, k): Pt => [
    radius * Math.cos(phase + (2 * Math.PI * k) / sides),
    radius * Math.sin(phase + (2 * Math.PI * k) / sides),
  ]);

export function close(actual: number, expected: number, rel = REL) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}
