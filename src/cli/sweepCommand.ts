// `sweep FILE --vary SURFACE.PROPERTY --from A --to B --steps N [--json | --csv]`:
// the heat exchange at N evenly spaced values of one parameter. --json prints
// {"values": [...], "runs": [...]}, each run exactly the object `exchange --json`
// prints for the file with that value. Units: as `exchange` (K, W/m^2, W per
// metre of depth); the parameter in its own unit (K, W/m^2, m, file units).
import { RESULTS_CAUTION } from '../document/exchange/cautions';
import type { Sketch } from '../document';
import { toScene } from '../document';
import {
  caseFactors,
  MAX_STUDY_STEPS,
  describeParameter,
  parameterProblem,
  parameterUnit,
  parseParameter,
  runSweep,
  sweepCsv,
  sweepRowOf,
  sweepRows,
  type StudyParameter,
  type SweepRowSource,
  type StudyRun,
  type ViewFactorsOf,
} from '../document/study';
import { parseArgs, type Format, type OwnOption } from './args';
import type { CliIO } from './io';
import { readSketchFile } from './readSketch';
import { threadedViewFactors, threadsFor, threadsOption, THREADS_HELP } from './threads';
import type { ViewFactorResult } from '../core/scene';
import { displayName, usageError as reportUsage } from './terminalText';

export const SWEEP_USAGE =
  'usage: npm run cli -- sweep FILE --vary SURFACE.PROPERTY --from A --to B --steps N [--json | --csv] [--threads N]';

export const STUDY_CAUTION = RESULTS_CAUTION;

const SWEEP_HELP = `${SWEEP_USAGE}

The gray-diffuse heat exchange at N evenly spaced values of one parameter,
from A to B (both included).
  --vary SURFACE.PROPERTY   PROPERTY: temperature (K), emissivity, heatFlux
                            (W/m^2), convectionCoefficient (W/(m^2 K)) of a
                            surface; x, y (the centre of the shape's bounding
                            box, a circle's centre; file units) to move the
                            shape SURFACE belongs to; radius of a circle;
                            ROW.pitch, ROW.diameter, ROW.distance of a tube
                            row (file units; its tubes are rebuilt); or
                            settings.surroundingsTemperature (K),
                            settings.gasTemperature (K), settings.depth (m).
                            Quote names with spaces.
  --from A --to B           the range, in the parameter's unit
  --steps N                 number of values, at least 2
  --json                    {"values": [...], "runs": [...]}: each run is what
                            exchange --json prints for the file with that value
  --csv                     one row per value: each surface's net heat (W/m)
                            and temperature (K)
${THREADS_HELP}
Temperature and heat flux are varied only on a surface that has that
condition in the file. Property and settings sweeps compute the view factors
once; position and tube-row sweeps compute them for every value. FILE '-' reads standard input.
${STUDY_CAUTION}
`;

/** What the study commands read besides FILE and the format. */
export interface StudyArgs {
  vary?: StudyParameter;
  from?: number;
  to?: number;
  steps?: number;
  target?: string;
  /** --threads: worker threads for each case's view factors (see threads.ts). */
  threads?: number;
}

/**
 * The study options as one OwnOption: --vary, --from, --to, --steps, --threads,
 * and --target when `withTarget`. Fills `into`; a problem is returned as text.
 */
export function studyOptions(into: StudyArgs, withTarget: boolean): OwnOption {
  return (arg, takeNext) => {
    const threads = threadsOption(arg, takeNext, into);
    if (threads !== undefined) return threads;
    const eq = arg.indexOf('=');
    const name = arg.startsWith('--') && eq > 0 ? arg.slice(0, eq) : arg;
    const known = ['--vary', '--from', '--to', '--steps', ...(withTarget ? ['--target'] : [])];
    if (!known.includes(name)) return undefined;
    const text = name === arg ? takeNext() : arg.slice(eq + 1);
    if (text === undefined) return `${name} needs a value`;
    if (name === '--vary') {
      const p = parseParameter(text);
      if (!p.ok) return `--vary: ${p.message}`;
      into.vary = p.value;
      return null;
    }
    if (name === '--target') {
      into.target = text;
      return null;
    }
    const value = text.trim() === '' ? Number.NaN : Number(text);
    if (!Number.isFinite(value)) return `${name} must be a number, got '${text.slice(0, 40)}'`;
    if (name === '--from') into.from = value;
    else if (name === '--to') into.to = value;
    else if (!Number.isInteger(value) || value < 2 || value > MAX_STUDY_STEPS)
      return `--steps must be a whole number from 2 to ${MAX_STUDY_STEPS}, got '${text.slice(0, 40)}'`;
    else into.steps = value;
    return null;
  };
}

/**
 * Each case's view factors over the threads asked for (or the default of threads.ts);
 * in-process, each case keeps the pairs its moved shapes cannot change since the
 * case before (caseFactors). The same bits either way. Over threads, a case writes
 * over the case before's surface factors: the study runner reads a case's factors
 * only while it solves that case (document/study/run.ts).
 */
export function studyViewFactors(study: StudyArgs): ViewFactorsOf {
  const inProcess = caseFactors();
  let last: ViewFactorResult | undefined;
  return (scene) => {
    if (threadsFor(scene, study.threads) <= 1) return inProcess(scene);
    last = threadedViewFactors(scene, study.threads, { reuse: last });
    return last;
  };
}

/** The problem with missing study options, or null. */
export function missingStudyOption(a: StudyArgs, needSteps: boolean): string | null {
  if (a.vary === undefined) return 'give the parameter to vary: --vary SURFACE.PROPERTY';
  if (a.from === undefined || a.to === undefined) return 'give the range: --from A --to B';
  if (needSteps && a.steps === undefined) return 'give the number of values: --steps N';
  return null;
}

/** Read the file and check the parameter against it; null when the command should exit 1 (message written). */
export function studySketch(
  command: string,
  file: string,
  p: StudyParameter,
  io: CliIO,
): { sketch: Sketch; names: string[] } | null {
  const sketch = readSketchFile(command, file, io);
  if (!sketch) return null;
  const names = toScene(sketch).surfaceNames;
  const problem = parameterProblem(sketch, names, p);
  if (problem) {
    io.err(`${command}: ${file}: ${problem}\n`);
    return null;
  }
  return { sketch, names };
}

/** Run the command; returns the exit code (0 done, 1 bad file or no answer, 2 bad arguments). */
export function runSweepCommand(args: string[], io: CliIO): number {
  const study: StudyArgs = {};
  const parsed = parseArgs(args, studyOptions(study, false));
  if (parsed.kind === 'help') {
    io.out(SWEEP_HELP);
    return 0;
  }
  const usageError = (problem: string) => reportUsage(io, 'sweep', SWEEP_USAGE, problem);
  if (parsed.kind === 'error') return usageError(parsed.problem);
  const missing = missingStudyOption(study, true);
  if (missing) return usageError(missing);
  const { format, file } = parsed;
  const p = study.vary!;
  const read = studySketch('sweep', file, p, io);
  if (!read) return 1;
  const range = [read.sketch, p, study.from!, study.to!, study.steps!] as const;
  const viewFactors = studyViewFactors(study);
  const failed = (message: string) => {
    io.err(`sweep: ${file}: ${message}\n`);
    return 1;
  };
  // --json prints every case's whole exchange; the table and CSV keep only what their rows need.
  if (format === 'json') {
    const outcome = runSweep(...range, { viewFactors });
    if (!outcome.ok) return failed(outcome.message);
    io.out(sweepJson(outcome.values, outcome.runs));
    return 0;
  }
  const outcome = runSweep(...range, { viewFactors, keep: sweepRowOf });
  if (!outcome.ok) return failed(outcome.message);
  io.out(sweepOutput(format, file, read.sketch, p, outcome.values, outcome.runs));
  return 0;
}

/**
 * `{"values":[...],"runs":[...]}`, the text JSON.stringify gives for the whole
 * object, made one run at a time: each run's object (its exchange matrix
 * surfaces^2 numbers) is built, written and dropped before the next.
 */
function sweepJson(values: number[], runs: readonly StudyRun[]): string {
  const parts = runs.map((r) => JSON.stringify(r.json()));
  return `{"values":${JSON.stringify(values)},"runs":[${parts.join(',')}]}\n`;
}

function sweepOutput(
  format: Format,
  file: string,
  sketch: Sketch,
  p: StudyParameter,
  values: number[],
  runs: readonly SweepRowSource[],
): string {
  if (format === 'csv') return sweepCsv(p, sketch.units, runs);
  const rows = sweepRows(p, sketch.units, runs).map((row) =>
    row.map((cell) => (typeof cell === 'number' ? String(Number(cell.toPrecision(6))) : displayName(cell, 40))),
  );
  const unit = parameterUnit(p, sketch.units);
  const lines = [
    `Sweep of ${describeParameter(p)}${unit ? ` (${unit})` : ''} in ${displayName(file, Infinity)}: ${values.length} values, per metre of depth`,
    '',
    ...columns(rows),
    '',
    'Net heat > 0: the surface gives off more radiation than it absorbs; < 0: it takes heat up.',
    STUDY_CAUTION,
  ];
  return `${lines.join('\n')}\n`;
}

/** Left-aligned columns, two spaces apart, indented by two. */
export function columns(rows: string[][]): string[] {
  const widths: number[] = [];
  for (const row of rows) row.forEach((cell, k) => (widths[k] = Math.max(widths[k] ?? 0, cell.length)));
  return rows.map((row) =>
    `  ${row.map((cell, k) => cell + ' '.repeat(widths[k] - cell.length)).join('  ')}`.trimEnd(),
  );
}
