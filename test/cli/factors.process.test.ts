import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

// The command as a real process (what `npm run cli -- ...` runs): exit codes,
// stdout/stderr separation, no stack traces.

const root = fileURLToPath(new URL('../..', import.meta.url));
const tsx = fileURLToPath(new URL('../../node_modules/tsx/dist/cli.mjs', import.meta.url));

function cli(args: string[], input?: string) {
  const r = spawnSync(process.execPath, [tsx, 'src/cli/main.ts', ...args], {
    cwd: root,
    input,
    encoding: 'utf8',
    timeout: 60000,
  });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

describe('factors as a process', () => {
  it('prints one JSON object for the example file and exits 0', () => {
    const r = cli(['factors', 'public/examples/duct-with-block.json', '--json']);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out) as {
      surfaces: { name: string; length: number }[];
      viewFactors: number[][];
      rowSumResidual: number[];
    };
    expect(out.surfaces.map((s) => s.name)).toEqual(['floor', 'right', 'roof', 'left', 'block']);
    // The example's own geometry: a 4 x 2 duct around a 0.5 x 0.5 block.
    expect(out.surfaces.map((s) => s.length)).toEqual([4, 2, 4, 2, 2]);
    const L = [4, 2, 4, 2, 2];
    expect(out.viewFactors.map((row) => row.length)).toEqual([5, 5, 5, 5, 5]);
    out.viewFactors.forEach((row, i) => {
      // Closed enclosure: every row sums to one (summation rule, Incropera et al., 6th ed., sec. 13.1; equation number from memory),
      // summed here from the printed factors; the printed residual is 1 minus that sum.
      const sum = row.reduce((a, f) => a + f, 0);
      expect(Math.abs(1 - sum)).toBeLessThan(1e-12);
      expect(Math.abs(out.rowSumResidual[i] - (1 - sum))).toBeLessThan(1e-15);
      // Reciprocity, L_i F_ij = L_j F_ji (Incropera et al., 6th ed., sec. 13.1; equation number from memory).
      row.forEach((f, j) => expect(Math.abs(L[i] * f - L[j] * out.viewFactors[j][i])).toBeLessThan(1e-12));
    });
    // The sketch is symmetric left/right: floor sees both side walls equally.
    expect(out.viewFactors[0][1]).toBeCloseTo(out.viewFactors[0][3], 12);
    // Flat walls do not see themselves; the convex block does not either.
    for (let i = 0; i < 5; i++) expect(out.viewFactors[i][i]).toBe(0);
  });

  it('reads standard input when FILE is -', () => {
    const text = JSON.stringify({
      version: 1,
      units: 'cm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [3, 0],
            [3, 4],
          ],
          surface: ['a', 'b', 'c'],
        },
      ],
    });
    const r = cli(['factors', '-', '--csv'], text);
    expect(r.code).toBe(0);
    // Three-sided enclosure, F_ab = (3 + 4 - 5) / (2 * 3) (Incropera et al., 6th ed., Table 13.1).
    expect(Number(r.out.split('\r\n')[1].split(',')[2])).toBeCloseTo(1 / 3, 12);
  });

  it('a bad file: exit 1, a short message, no stack trace', () => {
    const r = cli(['factors', 'public/examples/no-such-file.json']);
    expect(r.code).toBe(1);
    expect(r.out).toBe('');
    expect(r.err).toBe("factors: cannot read 'public/examples/no-such-file.json': no such file\n");
    const bad = cli(
      ['factors', '-'],
      '{"version": 1, "units": "m", "shapes": [{"kind": "solid", "points": [[0,0],[1,0]], "surface": "plate"}]}',
    );
    expect(bad.code).toBe(1);
    expect(bad.err).toBe("factors: -: 'plate' (body, shape 1): has 2 points; a shape needs at least 3\n");
    const dir = cli(['factors', 'public']);
    expect(dir.code).toBe(1);
    expect(dir.err).toMatch(/^factors: cannot read 'public': it is a directory, not a file\n$/);
  });

  it('bad arguments: exit 2', () => {
    const r = cli(['factors', '--json']);
    expect(r.code).toBe(2);
    expect(r.err).not.toMatch(/\n\s+at /);
    expect(cli([]).code).toBe(2);
  });
});
