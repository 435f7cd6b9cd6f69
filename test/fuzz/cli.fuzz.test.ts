// Fuzz: random sketches and mutated files through the command line (main()
// with files in memory), every command and output format. Exit 0 with finite
// numbers only (no NaN, Infinity or null), or exit 1 with a message on every
// line; never a stack trace. Every accepted factors table keeps the summation
// rule and reciprocity, recomputed here from the printed numbers.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { main } from '../../src/cli/main';
import type { CliIO } from '../../src/cli/io';
import {
  FUZZ_TIMEOUT,
  mutateText,
  mutateValue,
  runs,
  seed,
  sketchFile,
  textMutation,
  valueMutation,
} from './arbitraries';
import { NON_FINITE_WORD, expectInvariants, expectMessage, nonFinite } from './checks';

function run(args: string[], text: string) {
  let out = '';
  let err = '';
  const io: CliIO = {
    out: (t) => void (out += t),
    err: (t) => void (err += t),
    readFile: () => text,
  };
  return { code: main(args, io), out, err };
}

interface FactorsJson {
  surfaces: { name: string; length: number }[];
  viewFactors: number[][];
}

function checkCommand(command: 'factors' | 'exchange', format: '--json' | '--csv' | '', text: string): boolean {
  const args = [command, 'f.json', ...(format ? [format] : [])];
  const r = run(args, text);
  if (r.code !== 0) {
    expect(r.code).toBe(1);
    expect(r.out).toBe('');
    const lines = r.err.trimEnd().split('\n');
    for (const line of lines) {
      expect(line.startsWith(`${command}: `)).toBe(true);
      expectMessage(line.slice(command.length + 2));
    }
    return false;
  }
  for (const line of r.err.split('\n').filter(Boolean)) expect(line).toMatch(new RegExp(`^${command}: f\\.json: `));
  if (format === '--json') {
    const value: unknown = JSON.parse(r.out);
    expect(nonFinite(value)).toEqual([]);
    if (command === 'factors') {
      const f = value as FactorsJson;
      const lengths = f.surfaces.map((s) => s.length);
      // Every random sketch has an enclosure (unless a mutation removed it): then rows sum to one.
      const closed = text.includes('"enclosure"');
      expectInvariants(f.viewFactors.flat(), lengths, closed && !text.includes('"solid"') ? true : closed);
    }
  } else expect(r.out).not.toMatch(NON_FINITE_WORD);
  return true;
}

function checkAll(text: string): number {
  let accepted = 0;
  for (const command of ['factors', 'exchange'] as const)
    for (const format of ['--json', '--csv', ''] as const) if (checkCommand(command, format, text)) accepted++;
  return accepted;
}

describe('fuzz: the command line', () => {
  it(
    'random sketches',
    () => {
      let accepted = 0;
      fc.assert(
        fc.property(sketchFile, (file) => {
          accepted += checkAll(JSON.stringify(file));
        }),
        { numRuns: runs(60), seed: seed(1403) },
      );
      expect(accepted).toBeGreaterThan(0);
    },
    FUZZ_TIMEOUT,
  );

  it(
    'mutated files',
    () => {
      fc.assert(
        fc.property(sketchFile, textMutation, valueMutation, (file, edit, m) => {
          checkAll(mutateText(JSON.stringify(file), edit));
          checkAll(JSON.stringify(mutateValue(file, m)));
        }),
        { numRuns: runs(40), seed: seed(1404) },
      );
    },
    FUZZ_TIMEOUT,
  );
});
