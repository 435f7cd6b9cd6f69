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

describe('matrix CSV', () => {
  it('is the same text the command line prints with --csv', () => {
    expect(shownCsv(shownFor(demoSketch))).toBe(cliCsv(demoSketch));
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
