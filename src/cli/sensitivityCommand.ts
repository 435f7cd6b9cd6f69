// `sensitivity FILE [--json | --csv] [--emissivity-range SURFACE=LOW:HIGH ...]`:
// how each surface's net heat changes per unit change of each emissivity and
// each fixed temperature (the derivative of the radiosity solution), and with
// emissivity ranges the lowest and highest net heat of each surface.
// Units: W per metre of depth per unit emissivity; W/(m K) per kelvin.
import { toCsv, toScene, type CsvCell } from '../document';
import { SURROUNDINGS_LABEL } from '../document/exchange/labels';
import { solveSketchExchange } from '../document/exchangeInput';
import {
  emissivityBounds,
  parseEmissivityRange,
  sensitivityTable,
  type EmissivityBounds,
  type EmissivityRange,
  type SensitivityRow,
} from '../document/study';
import { parseArgs } from './args';
import { threadedViewFactors, threadsOption, THREADS_HELP } from './threads';
import type { CliIO } from './io';
import { readSketchFile } from './readSketch';
import { STUDY_CAUTION, columns } from './sweepCommand';
import { displayName, usageError as reportUsage } from './terminalText';

export const SENSITIVITY_USAGE =
  'usage: npm run cli -- sensitivity FILE [--json | --csv] [--emissivity-range SURFACE=LOW:HIGH ...] [--threads N]';

const BOUNDS_METHOD =
  'Lowest and highest over every corner of the ranges (each emissivity at an end): exact when each net heat is monotone in each emissivity over the ranges. A derivative that changes sign between corners flags the surface: its extremes may lie inside the ranges. No flag does not prove monotonicity.';

const SENSITIVITY_HELP = `${SENSITIVITY_USAGE}

How each surface's net heat changes per unit change of each emissivity and
each fixed temperature (and the surroundings temperature of an open sketch):
the derivative of the radiosity solution, one extra solve per parameter.
  --json    {"surfaces": [...], "rows": [{"parameter", "unit", "netHeat": [...],
            "surroundingsNetHeat"}], and with ranges "bounds"}
  --csv     one row per parameter (with ranges: one row per surface with its
            lowest and highest net heat)
  --emissivity-range SURFACE=LOW:HIGH
            an emissivity known only to lie in [LOW, HIGH]; repeat for more
            (at most 12). ${BOUNDS_METHOD}
${THREADS_HELP}
Units: W/m per unit emissivity; W/(m K) per kelvin. Signed as net heat:
positive means the surface gives off more as the parameter rises.
${STUDY_CAUTION}
`;

/** Run the command; returns the exit code (0 done, 1 bad file or no answer, 2 bad arguments). */
export function runSensitivity(args: string[], io: CliIO): number {
  const ranges: EmissivityRange[] = [];
  const options: { threads?: number } = {};
  const parsed = parseArgs(args, (arg, takeNext) => {
    const threads = threadsOption(arg, takeNext, options);
    if (threads !== undefined) return threads;
    const name = '--emissivity-range';
    if (arg !== name && !arg.startsWith(`${name}=`)) return undefined;
    const text = arg === name ? takeNext() : arg.slice(name.length + 1);
    if (text === undefined) return `${name} needs SURFACE=LOW:HIGH`;
    const range = parseEmissivityRange(text);
    if (!range.ok) return `${name}: ${range.message}`;
    ranges.push(range.value);
    return null;
  });
  if (parsed.kind === 'help') {
    io.out(SENSITIVITY_HELP);
    return 0;
  }
  if (parsed.kind === 'error') return reportUsage(io, 'sensitivity', SENSITIVITY_USAGE, parsed.problem);
  const { format, file } = parsed;
  const fail = (message: string) => {
    io.err(`sensitivity: ${file}: ${message}\n`);
    return 1;
  };
  const sketch = readSketchFile('sensitivity', file, io);
  if (!sketch) return 1;
  const { scene, surfaceNames: names } = toScene(sketch);
  const factors = threadedViewFactors(scene, options.threads);
  if (!factors.F.every(Number.isFinite) || !factors.surfaceLength.every(Number.isFinite))
    return fail('internal error: the view factors came out non-finite; please report this file');
  const solved = solveSketchExchange(sketch, names, factors);
  if (!solved.ok) return fail(solved.message);
  const table = sensitivityTable(names, solved.input, solved.result);
  if (!table.ok) return fail(table.message);
  let bounds: EmissivityBounds | undefined;
  if (ranges.length > 0) {
    const found = emissivityBounds(sketch, ranges, factors);
    if (!found.ok) return fail(found.message);
    bounds = found.bounds;
  }
  const open = table.rows.some((r) => r.surroundingsNetHeat !== undefined);
  if (format === 'json') io.out(`${JSON.stringify(sensitivityJson(names, table.rows, bounds))}\n`);
  else if (format === 'csv')
    io.out(bounds ? toCsv(boundsRows(bounds)) : toCsv(sensitivityRows(names, table.rows, open)));
  else io.out(sensitivityText(file, names, table.rows, open, bounds));
  return 0;
}

function sensitivityJson(names: string[], rows: SensitivityRow[], bounds: EmissivityBounds | undefined) {
  return {
    surfaces: names,
    rows: rows.map(({ parameter, unit, netHeat, surroundingsNetHeat }) => ({
      parameter,
      unit,
      netHeat,
      ...(surroundingsNetHeat !== undefined ? { surroundingsNetHeat } : {}),
    })),
    ...(bounds
      ? {
          bounds: {
            method: BOUNDS_METHOD,
            corners: bounds.corners,
            surfaces: names.map((name, i) => ({
              name,
              lowest: bounds.low[i],
              highest: bounds.high[i],
              mayNotBeMonotone: bounds.notMonotone[i],
            })),
            ...(bounds.surroundings
              ? { surroundings: { lowest: bounds.surroundings.low, highest: bounds.surroundings.high } }
              : {}),
          },
        }
      : {}),
  };
}

function sensitivityRows(names: string[], rows: SensitivityRow[], open: boolean): CsvCell[][] {
  const header: CsvCell[] = ['parameter', 'unit', ...names.map((n) => `${n}: net heat change`)];
  if (open) header.push(`${SURROUNDINGS_LABEL.name}: net heat change`);
  return [
    header,
    ...rows.map((r) => [r.parameter, r.unit, ...r.netHeat, ...(open ? [r.surroundingsNetHeat ?? 0] : [])]),
  ];
}

function boundsRows(b: EmissivityBounds): CsvCell[][] {
  const rows: CsvCell[][] = [['surface', 'lowest net heat (W/m)', 'highest net heat (W/m)', 'may not be monotone']];
  b.names.forEach((name, i) => rows.push([name, b.low[i], b.high[i], b.notMonotone[i] ? 'yes' : 'no']));
  if (b.surroundings) rows.push([SURROUNDINGS_LABEL.name, b.surroundings.low, b.surroundings.high, '']);
  return rows;
}

const fmt = (x: number) => (x === 0 ? '0' : String(Number(x.toPrecision(6))));

function sensitivityText(
  file: string,
  names: string[],
  rows: SensitivityRow[],
  open: boolean,
  bounds: EmissivityBounds | undefined,
): string {
  const text = (cells: CsvCell[][]) =>
    columns(cells.map((row) => row.map((c) => (typeof c === 'number' ? fmt(c) : displayName(c, 40)))));
  const lines = [
    `Change of net heat (W per metre of depth) per unit change of each parameter, ${displayName(file, Infinity)}`,
    '',
    ...text(sensitivityRows(names, rows, open)),
    '',
    'Positive: the surface gives off more (or takes up less) as the parameter rises.',
  ];
  if (bounds)
    lines.push(
      '',
      `Net heat (W/m) over the emissivity ranges (${bounds.corners} cases):`,
      '',
      ...text(boundsRows(bounds)),
      '',
      BOUNDS_METHOD,
    );
  lines.push(STUDY_CAUTION);
  return `${lines.join('\n')}\n`;
}
