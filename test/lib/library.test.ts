import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { exchange, readSketch, sensitivity, solveFor, sweep, viewFactors } from '../../src/lib';
import { cliJson, kiln } from '../cli/studyHelpers';

// The library gives the command line's results: each function is compared with
// the matching command's --json output for the same file.

function sketchOf(file: unknown) {
  const read = readSketch(file);
  if (!read.ok) throw new Error(read.messages.join('; '));
  return read.sketch;
}

describe('the library entry (src/lib)', () => {
  const file = kiln(true);
  const files = { 'k.json': file };

  it('readSketch refuses a bad file with messages', () => {
    const read = readSketch('{"version": 2, "units": "m", "shapes": [{"kind": "solid"}]}');
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.messages.join('\n')).toMatch(/shape 1/);
  });

  it('viewFactors and exchange equal factors --json and exchange --json', () => {
    const sketch = sketchOf(file);
    const factors = cliJson(files, 'factors', 'k.json') as { surfaces: { name: string }[]; viewFactors: number[][] };
    const own = viewFactors(sketch);
    expect(own.names).toEqual(factors.surfaces.map((s) => s.name));
    expect(own.viewFactors).toEqual(factors.viewFactors);
    const one = exchange(sketch);
    expect(one.ok && one.json).toEqual(cliJson(files, 'exchange', 'k.json'));
    const deep = exchange(sketch, { depth: 2.5 });
    expect(deep.ok && deep.json).toEqual(cliJson(files, 'exchange', 'k.json', '--depth', '2.5'));
  });

  it('sweep, solveFor and sensitivity equal the commands', () => {
    const sketch = sketchOf(file);
    const range = ['--from', '1100', '--to', '1300'];
    const s = sweep(sketch, 'hearth.temperature', 1100, 1300, 3);
    expect(s.ok && { values: s.values, runs: s.runs }).toEqual(
      cliJson(files, 'sweep', 'k.json', '--vary', 'hearth.temperature', ...range, '--steps', '3'),
    );
    const target = 'ware stack.2.netHeat=-150000';
    const solved = solveFor(sketch, 'hearth.temperature', 1100, 1300, target);
    const cli = cliJson(files, 'solve-for', 'k.json', '--vary', 'hearth.temperature', ...range, '--target', target) as {
      value: number;
      run: unknown;
    };
    expect(solved.ok && solved.value).toBe(cli.value);
    expect(solved.ok && solved.run).toEqual(cli.run);
    const rows = sensitivity(sketch);
    expect(rows.ok && rows.rows.map((r) => r.netHeat)).toEqual(
      (cliJson(files, 'sensitivity', 'k.json') as { rows: { netHeat: number[] }[] }).rows.map((r) => r.netHeat),
    );
  });

  it('refuses, not throws: a parameter the sketch cannot vary, a range with no answer', () => {
    const sketch = sketchOf(file);
    expect(sweep(sketch, 'crown.temperature', 1, 2, 2)).toMatchObject({
      ok: false,
      message: /no temperature condition/,
    });
    expect(solveFor(sketch, 'hearth.temperature', 1100, 1101, 'ware stack.2.netHeat=1')).toMatchObject({
      ok: false,
      message: /does not reach/,
    });
  });

  it('a script imports it by the package name (package.json exports) and runs under tsx', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'tautline-lib-'));
    try {
      // Inside the checkout, so the package name resolves to this package (self-reference through "exports").
      const script = path.join(process.cwd(), 'test-artifacts', `lib-script-${process.pid}.ts`);
      writeFileSync(path.join(dir, 'k.json'), JSON.stringify(file));
      mkdirSync(path.dirname(script), { recursive: true });
      writeFileSync(
        script,
        [
          "import { readFileSync } from 'node:fs';",
          "import { exchange, readSketch } from 'tautline';",
          `const read = readSketch(readFileSync(${JSON.stringify(path.join(dir, 'k.json'))}, 'utf8'));`,
          'if (!read.ok) throw new Error(read.messages.join());',
          'const out = exchange(read.sketch);',
          'process.stdout.write(JSON.stringify(out.ok ? out.json : out));',
        ].join('\n'),
      );
      try {
        const tsx = path.join(process.cwd(), 'node_modules', '.bin', 'tsx');
        const run = spawnSync(tsx, [script], { encoding: 'utf8' });
        expect(run.stderr).toBe('');
        expect(JSON.parse(run.stdout)).toEqual(cliJson(files, 'exchange', 'k.json'));
      } finally {
        rmSync(script, { force: true });
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('the bin script (npx tautline) runs the command line: same output and exit code', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'tautline-bin-'));
    try {
      writeFileSync(path.join(dir, 'k.json'), JSON.stringify(file));
      const bin = path.join(process.cwd(), 'src', 'cli', 'bin.js');
      const ok = spawnSync(process.execPath, [bin, 'exchange', path.join(dir, 'k.json'), '--json'], {
        encoding: 'utf8',
      });
      expect(ok.status).toBe(0);
      expect(JSON.parse(ok.stdout)).toEqual(cliJson(files, 'exchange', 'k.json'));
      const bad = spawnSync(process.execPath, [bin, 'exchange', path.join(dir, 'missing.json')], { encoding: 'utf8' });
      expect(bad.status).toBe(1);
      expect(bad.stderr).toMatch(/no such file/);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
