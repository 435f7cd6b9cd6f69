import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { shownCsv, matrixTsv } from '../../src/state/matrixExport';
import { matrixView } from '../../src/state/matrixView';
import type { ShownResult } from '../../src/state/results/derive';
import { documentApi } from '../../src/state/documentApi';
import { demoSketch } from '../../src/state/demo';
import { renameSurface } from '../../src/state/edits/surfaceEdits';
import { computeViewFactors } from '../../src/core/viewFactors';
import { runFactors } from '../../src/cli/factorsCommand';
import type { SketchFile } from '../../src/state/sketchFile';

/** The checked form of a sketch, as the app passes it to toScene. */
function checked(doc: unknown) {
  const r = documentApi.restore(doc);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.sketch;
}

function shownFor(doc: SketchFile): ShownResult {
  const sketch = checked(doc);
  const { scene, surfaceNames } = documentApi.toScene(sketch);
  return {
    sketch,
    names: surfaceNames,
    units: sketch.units,
    stale: false,
    result: computeViewFactors(scene),
    elapsedMs: 0,
  };
}

function cliCsv(doc: SketchFile): string {
  let out = '';
  const code = runFactors(['sketch.json', '--csv'], {
    out: (t) => {
      out += t;
    },
    err: () => {},
    readFile: () => documentApi.serialize(doc),
  });
  expect(code).toBe(0);
  return out;
}

/** A 4 x 2 rectangular duct, one named surface per wall, anticlockwise from the floor. */
const duct: SketchFile = {
  version: 1,
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
};

describe('matrix CSV', () => {
  it('is the same text the command line prints with --csv', () => {
    // The two share a writer, so this is an agreement check; the next test checks the content.
    expect(shownCsv(shownFor(demoSketch))).toBe(cliCsv(demoSketch));
    expect(shownCsv(shownFor(duct))).toBe(cliCsv(duct));
  });

  it("holds the rectangle's crossed-string factors in the right cells", () => {
    // Hottel's crossed strings, F_ij = (crossed - uncrossed) / (2 L_i) (Incropera et al., Fundamentals of
    // Heat and Mass Transfer, 6th ed., Table 13.1 and sec. 13.1): the diagonal is sqrt(20); adjacent walls
    // (L_i + L_j - diagonal) / (2 L_i); opposite walls (2 diagonal - 2 gap) / (2 L_i); flat walls F_ii = 0.
    const d = Math.sqrt(20);
    const L = [4, 2, 4, 2];
    const F = (i: number, j: number) =>
      i === j ? 0 : (i - j + 4) % 2 === 0 ? (2 * d - 2 * L[(i + 1) % 4]) / (2 * L[i]) : (L[i] + L[j] - d) / (2 * L[i]);
    const rows = Papa.parse<string[]>(shownCsv(shownFor(duct)).trim(), { newline: '\r\n' }).data;
    expect(rows.map((r) => r[0])).toEqual(['from \\ to', 'floor', 'right', 'roof', 'left']);
    expect(rows[0]).toEqual(['from \\ to', 'floor', 'right', 'roof', 'left']);
    for (let i = 0; i < 4; i++) {
      expect(rows[i + 1]).toHaveLength(5);
      for (let j = 0; j < 4; j++) expect(Math.abs(Number(rows[i + 1][j + 1]) - F(i, j))).toBeLessThanOrEqual(1e-12);
    }
    // Spot values by hand: floor to roof (2 sqrt 20 - 4) / 8 = 0.618..., right to floor (6 - sqrt 20) / 4 = 0.381...
    expect(Number(rows[1][3])).toBeCloseTo(0.6180339887, 9);
    expect(Number(rows[2][1])).toBeCloseTo(0.3819660113, 9);
  });

  it('has a header of names, a first column of names and every factor in full precision', () => {
    const shown = shownFor(demoSketch);
    const rows = Papa.parse<string[]>(shownCsv(shown).trim(), { newline: '\r\n' }).data;
    const n = shown.result.surfaceCount;
    expect(rows[0]).toEqual(['from \\ to', ...shown.names]);
    expect(rows).toHaveLength(n + 1);
    for (let i = 0; i < n; i++) {
      expect(rows[i + 1][0]).toBe(shown.names[i]);
      // Round trip through text gives back the very same doubles.
      expect(rows[i + 1].slice(1).map(Number)).toEqual(Array.from(shown.result.F.subarray(i * n, (i + 1) * n)));
    }
  });

  it('neutralises names a spreadsheet would run as formulas, in CSV and in the clipboard copy', () => {
    const doc = renameSurface(demoSketch, 'tube 1', '=HYPERLINK("x")');
    const shown = shownFor(doc);
    const csv = shownCsv(shown);
    expect(csv).toContain(`"'=HYPERLINK(""x"")"`);
    expect(csv).not.toMatch(/(^|,)=HYPERLINK/m);
    const tsv = matrixTsv(matrixView(shown), 3);
    expect(tsv.split('\n')[0].split('\t')).toContain(`'=HYPERLINK("x")`);
    expect(tsv.split('\n')[1].split('\t')[1]).toBe(shown.result.F[0].toFixed(3));
  });
});
