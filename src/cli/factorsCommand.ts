// `factors FILE [--json | --csv]`: the view factor between every pair of named
// surfaces of a sketch file, as a readable table, one JSON object, or CSV.
import type { ViewFactorResult } from '../core/scene';
import { matrixCsv, toScene, type Sketch } from '../document';
import { SURROUNDINGS_LABEL } from '../document/exchange/labels';
import type { CliIO } from './io';
import { parseArgs } from './args';
import { readSketchFile } from './readSketch';
import { displayName, usageError as reportUsage } from './terminalText';
import { threadedViewFactors, threadsOption, THREADS_HELP } from './threads';

export const FACTORS_USAGE = 'usage: npm run cli -- factors FILE [--json | --csv] [--threads N]';
const usageError = (io: CliIO, problem: string) => reportUsage(io, 'factors', FACTORS_USAGE, problem);

const FACTORS_HELP = `${FACTORS_USAGE}

View factors between the named surfaces of a sketch file (row = from,
column = to, surfaces in order of first appearance along the edges).
  --json   one JSON object: surfaces (name, length), viewFactors,
           rowSumResidual (1 - row sum), reciprocityResidual
  --csv    the matrix as CSV, header row and first column of names
${THREADS_HELP}
Lengths are in the file's units; view factors are dimensionless.
FILE '-' reads standard input.
`;

/** Run the command; returns the exit code (0 done, 1 bad file, 2 bad arguments). */
export function runFactors(args: string[], io: CliIO): number {
  const options: { threads?: number } = {};
  const parsed = parseArgs(args, (arg, takeNext) => threadsOption(arg, takeNext, options));
  if (parsed.kind === 'help') {
    io.out(FACTORS_HELP);
    return 0;
  }
  if (parsed.kind === 'error') return usageError(io, parsed.problem);
  const { format, file } = parsed;

  const sketch = readSketchFile('factors', file, io);
  if (!sketch) return 1;

  const { scene, surfaceNames } = toScene(sketch);
  const result = threadedViewFactors(scene, options.threads);
  if (!allFinite(result)) {
    io.err(`factors: ${file}: internal error: the computation produced a non-finite number; please report this file\n`);
    return 1;
  }
  if (format === 'json') io.out(`${JSON.stringify(factorsJson(surfaceNames, result))}\n`);
  else if (format === 'csv') io.out(matrixCsv(surfaceNames, result.F));
  else io.out(factorsTable(file, sketch, surfaceNames, result));
  return 0;
}

/** The --json object: row = from, column = to, both in the order of `surfaces`. */
export function factorsJson(names: string[], result: ViewFactorResult) {
  const n = result.surfaceCount;
  return {
    surfaces: names.map((name, i) => ({ name, length: result.surfaceLength[i] })),
    viewFactors: Array.from({ length: n }, (_, i) => Array.from(result.F.subarray(i * n, (i + 1) * n))),
    rowSumResidual: Array.from(result.rowSumResidual),
    reciprocityResidual: result.reciprocityResidual,
  };
}

function factorsTable(file: string, sketch: Sketch, names: string[], r: ViewFactorResult): string {
  const n = r.surfaceCount;
  const shown = names.map((name) => displayName(name));
  const width = Math.max(7, ...shown.map((s) => s.length));
  const cell = 10;
  const pad = (s: string, w: number) => s + ' '.repeat(Math.max(0, w - s.length));
  const lines: string[] = [];
  lines.push(
    `View factors of ${displayName(file, Infinity)} (${n} surface${n === 1 ? '' : 's'}, lengths in ${sketch.units})`,
    '',
  );
  lines.push(`  ${pad('surface', width)}  length`);
  shown.forEach((s, i) => lines.push(`  ${pad(s, width)}  ${formatLength(r.surfaceLength[i])}`));
  lines.push('', 'F (row = from, column = to):');
  const header = shown.map((s) => pad(s.length > cell - 1 ? `${s.slice(0, cell - 2)}…` : s, cell)).join('');
  lines.push(`  ${pad('', width)}  ${header}${r.closed ? '' : SURROUNDINGS_LABEL.name}`.trimEnd());
  for (let i = 0; i < n; i++) {
    let row = '';
    for (let j = 0; j < n; j++) row += pad(fixed6(r.F[i * n + j]), cell);
    if (!r.closed) row += fixed6(r.rowSumResidual[i]);
    lines.push(`  ${pad(shown[i], width)}  ${row.trimEnd()}`);
  }
  lines.push('');
  if (r.closed) {
    const worst = Math.max(0, ...Array.from(r.rowSumResidual, Math.abs));
    lines.push(`Enclosure rule: largest |1 - row sum| = ${worst.toExponential(1)}`);
  } else {
    lines.push('Open sketch (no enclosure): the last column is the factor to the surroundings, 1 - row sum.');
  }
  lines.push(`Reciprocity: largest relative |L_I F_IJ - L_J F_JI| = ${r.reciprocityResidual.toExponential(1)}`);
  return `${lines.join('\n')}\n`;
}

/** Six decimals; rounding noise such as -1e-32 shows as 0.000000, not -0.000000 (the JSON keeps every digit). */
function fixed6(x: number): string {
  const text = x.toFixed(6);
  return text === '-0.000000' ? '0.000000' : text;
}

function formatLength(x: number): string {
  return String(Number(x.toPrecision(8)));
}

function allFinite(r: ViewFactorResult): boolean {
  const arrays = [r.F, r.surfaceLength, r.rowSumResidual];
  return Number.isFinite(r.reciprocityResidual) && arrays.every((a) => a.every(Number.isFinite));
}
