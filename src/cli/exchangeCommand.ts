// `exchange FILE [--json | --csv] [--depth METRES]`: the surface heat balance
// of a sketch file (gray-diffuse radiation, convection to a transparent gas,
// walls, tubes, linked plates), per metre of depth.
// Units: lengths in the file's units; temperature K; heat W per metre of
// depth; net flux and radiosity W/m^2; totals W. Net heat and net flux are
// positive when a surface gives off more radiation than it absorbs.
// A surface without properties gets emissivity 0.9 and is adiabatic
// (reradiating), see src/core/exchange/setup.ts; the sketch-to-solver mapping
// and the wording of failures are shared with the app (src/document/exchangeInput.ts).
import { RESULTS_CAUTION } from '../document/exchange/cautions';
import type { BalanceCondition, BalanceResult } from '../core/balance';
import type { ViewFactorResult } from '../core/scene';
import { toScene, type Sketch } from '../document';
import {
  GAS_LABEL,
  SURROUNDINGS_LABEL,
  conditionInTable,
  exchangeCsv,
  hasGas,
  layerTemperaturesCell,
  seesSurroundings,
} from '../document/exchangeCsv';
import { GAS_CAUTION, WALL_TUBE_CAUTION, burnWarning } from '../document/exchange/cautions';
import { solveSketchExchange } from '../document/exchangeInput';
import { exchangeJson } from '../document/exchangeJson';
import type { CliIO } from './io';
import { parseArgs } from './args';
import { threadedViewFactors, threadsOption, THREADS_HELP } from './threads';
import { profileCsv, surfaceProfile } from '../document/exchange/profile';
import { readSketchFile } from './readSketch';
import { displayName, usageError as reportUsage } from './terminalText';

export const EXCHANGE_USAGE =
  'usage: npm run cli -- exchange FILE [--json | --csv | --profile NAME] [--depth METRES] [--threads N]';
// The --json object is built in src/document (shared with the design studies and the library).
export { exchangeJson };
const usageError = (io: CliIO, problem: string) => reportUsage(io, 'exchange', EXCHANGE_USAGE, problem);

const CAUTION = RESULTS_CAUTION;

const EXCHANGE_HELP = `${EXCHANGE_USAGE}

The surface heat balance of a sketch file, per metre of depth: gray-diffuse
radiation (net-radiation method) between the named surfaces, convection to
the gas, and what lies behind each surface (held temperature, heat flux,
adiabatic, opening, wall, tube, linked plate).
  --json            one JSON object: surfaces (name, length, emissivity,
                    temperature, netHeat, netFlux, radiosity, convectionHeat,
                    suppliedHeat; walls: layerTemperatures,
                    coldFaceTemperature; tubes: innerTemperature), exchange
                    (net heat from row to column), gas, energyBalance
  --csv             one row per surface
  --profile NAME    CSV of the local net flux around a tube split into arcs
                    ("NAME 1", "NAME 2"... or "NAME a"..., angle of each arc's middle in
                    degrees anticlockwise from +x) or along a wall split
                    into parts (position of each part's middle)
  --depth METRES    length of the long dimension; adds totals in W
                    (default: the file's settings.depth, if any)
${THREADS_HELP}
Units: length in the file's units, temperature K, heat W per metre of
depth, netFlux and radiosity W/m^2, totals W. netHeat > 0: the surface gives
off more radiation than it absorbs; suppliedHeat = netHeat + convectionHeat,
the heat supplied from behind. A surface with no properties has
emissivity 0.9 and is adiabatic. Open sketches and openings need
settings.surroundingsTemperature (K). FILE '-' reads standard input.
${CAUTION}
`;

/** Run the command; returns the exit code (0 done, 1 bad file or no answer, 2 bad arguments). */
export function runExchange(args: string[], io: CliIO): number {
  let depthArg: number | undefined;
  let profileName: string | undefined;
  const options: { threads?: number } = {};
  const parsed = parseArgs(args, (arg, takeNext) => {
    const threads = threadsOption(arg, takeNext, options);
    if (threads !== undefined) return threads;
    if (arg === '--profile' || arg.startsWith('--profile=')) {
      const name = arg === '--profile' ? takeNext() : arg.slice('--profile='.length);
      if (!name) return '--profile needs a surface name';
      profileName = name;
      return null;
    }
    if (arg !== '--depth' && !arg.startsWith('--depth=')) return undefined;
    const text = arg === '--depth' ? takeNext() : arg.slice('--depth='.length);
    if (text === undefined) return '--depth needs a number of metres';
    const value = text.trim() === '' ? Number.NaN : Number(text);
    if (!(Number.isFinite(value) && value > 0))
      return `--depth must be a number of metres above 0, got '${text.slice(0, 40)}'`;
    depthArg = value;
    return null;
  });
  if (parsed.kind === 'help') {
    io.out(EXCHANGE_HELP);
    return 0;
  }
  if (parsed.kind === 'error') return usageError(io, parsed.problem);
  const { format, file } = parsed;

  const sketch = readSketchFile('exchange', file, io);
  if (!sketch) return 1;

  const { scene, surfaceNames } = toScene(sketch);
  const factors = threadedViewFactors(scene, options.threads);
  if (!factors.F.every(Number.isFinite) || !factors.surfaceLength.every(Number.isFinite)) {
    io.err(`exchange: ${file}: internal error: the view factors came out non-finite; please report this file\n`);
    return 1;
  }
  const outcome = solveSketchExchange(sketch, surfaceNames, factors, depthArg);
  if (!outcome.ok) {
    io.err(`exchange: ${file}: ${outcome.message}\n`);
    return 1;
  }
  const { result } = outcome;
  const conditions = outcome.input.conditions;
  const report: Report = { file, sketch, names: surfaceNames, factors, result, conditions };
  if (profileName !== undefined) {
    if (format !== 'table') return usageError(io, '--profile prints CSV; leave out --json and --csv');
    const index = new Map(surfaceNames.map((n, i) => [n, i]));
    const at = (n: string) => index.get(n);
    const p = surfaceProfile(
      sketch.shapes,
      profileName,
      (n) => {
        const i = at(n);
        return i === undefined ? undefined : result.netFlux[i];
      },
      (n) => {
        const i = at(n);
        return i === undefined
          ? undefined
          : { temperature: result.temperature[i], innerTemperature: result.innerTemperature?.[i] };
      },
    );
    if ('problem' in p) {
      io.err(`exchange: ${file}: ${p.problem}\n`);
      return 1;
    }
    io.out(profileCsv(p, sketch.units));
    return 0;
  }
  if (format === 'json') io.out(`${JSON.stringify(exchangeJson(report))}\n`);
  else if (format === 'csv')
    io.out(
      exchangeCsv({
        units: sketch.units,
        names: surfaceNames,
        surfaceLength: factors.surfaceLength,
        result,
        conditions,
      }),
    );
  else io.out(exchangeTable(report));
  return 0;
}

interface Report {
  file: string;
  sketch: Sketch;
  names: string[];
  factors: ViewFactorResult;
  result: BalanceResult;
  conditions: ReadonlyArray<BalanceCondition>;
}

function exchangeTable({ file, sketch, names, factors, result: r, conditions }: Report): string {
  const n = r.surfaceCount;
  const shown = names.map((s) => displayName(s));
  const open = seesSurroundings(r);
  const withDepth = r.depth !== undefined;
  const lines: string[] = [];
  lines.push(
    `Heat exchange of ${displayName(file, Infinity)} (${n} surface${n === 1 ? '' : 's'}, lengths in ${sketch.units}, per metre of depth)`,
    '',
  );
  const head = [
    'surface',
    'length',
    'emissivity',
    'condition',
    'T (K)',
    'net heat (W/m)',
    'net flux (W/m^2)',
    'radiosity (W/m^2)',
    'convection (W/m)',
    'supplied (W/m)',
  ];
  const walls = conditions.some((c) => c.kind === 'wall');
  const tubes = conditions.some((c) => c.kind === 'tube');
  if (walls) head.push('cold face (K)', 'layers (K)');
  if (tubes) head.push('inner (K)');
  if (withDepth) head.push(`total (W) over ${fmt(r.depth!)} m`);
  const extras = (i: number | null): string[] => [
    ...(walls
      ? i !== null && conditions[i].kind === 'wall'
        ? [r.coldFaceTemperature[i].toFixed(2), layerTemperaturesCell(r.layerTemperatures[i])]
        : ['', '']
      : []),
    ...(tubes ? [i !== null && conditions[i].kind === 'tube' ? r.innerTemperature[i].toFixed(2) : ''] : []),
  ];
  const body: string[][] = names.map((_, i) => {
    const row = [
      shown[i],
      fmt(factors.surfaceLength[i]),
      fmt(r.emissivity[i]),
      conditionInTable(conditions[i].kind),
      r.temperature[i].toFixed(2),
      fmt(r.netHeat[i]),
      fmt(r.netFlux[i]),
      fmt(r.radiosity[i]),
      fmt(r.convectionHeat[i]),
      fmt(r.suppliedHeat[i]),
      ...extras(i),
    ];
    if (withDepth) row.push(fmt(r.netHeatTotal![i]));
    return row;
  });
  if (open) {
    const row = [
      SURROUNDINGS_LABEL.name,
      '',
      '1',
      SURROUNDINGS_LABEL.condition,
      r.surroundingsTemperature!.toFixed(2),
      fmt(r.surroundingsNetHeat),
      '',
      '',
      '0',
      fmt(r.surroundingsNetHeat),
      ...extras(null),
    ];
    if (withDepth) row.push(fmt(r.surroundingsNetHeatTotal!));
    body.push(row);
  }
  if (hasGas(r)) {
    const row = [GAS_LABEL.name, '', '', GAS_LABEL.condition, r.gasTemperature!.toFixed(2), '', '', ''];
    row.push(fmt(r.gasConvectionHeat), fmt(r.gasConvectionHeat), ...extras(null));
    if (withDepth) row.push('');
    body.push(row);
  }
  lines.push(...columns([head, ...body]));
  lines.push('', "Net exchange q'_ij, W per metre of depth, from row to column:");
  const matrixHead = ['', ...shown.map((s) => (s.length > 12 ? `${s.slice(0, 11)}…` : s))];
  if (open) matrixHead.push(SURROUNDINGS_LABEL.name);
  const matrixRows = names.map((_, i) => {
    const row = [shown[i]];
    for (let j = 0; j < n; j++) row.push(fmt(r.exchange[i * n + j]));
    if (open) row.push(fmt(r.surroundingsExchange[i]));
    return row;
  });
  lines.push(...columns([matrixHead, ...matrixRows]));
  const burns = names.flatMap((name, i) =>
    conditions[i].kind === 'wall' ? (burnWarning(name, r.coldFaceTemperature[i]) ?? []) : [],
  );
  lines.push(
    '',
    `Energy balance: |sum of supplied heat, gas and surroundings| / sum of radiation leaving the surfaces = ${r.energyBalance.toExponential(1)}`,
    'Net heat > 0: the surface gives off more radiation than it absorbs; < 0: it takes heat up. Supplied = net heat + convection: the heat from behind.',
    ...burns.map((b) => `Warning: ${b}.`),
    ...(hasGas(r) ? [GAS_CAUTION] : []),
    ...(walls || tubes ? [WALL_TUBE_CAUTION] : []),
    CAUTION,
  );
  return `${lines.join('\n')}\n`;
}

/** Six significant digits, no trailing zeros. */
function fmt(x: number): string {
  if (x === 0) return '0';
  return String(Number(x.toPrecision(6)));
}

/** Left-aligned columns, two spaces apart, indented by two. */
function columns(rows: string[][]): string[] {
  const widths: number[] = [];
  for (const row of rows) row.forEach((cell, k) => (widths[k] = Math.max(widths[k] ?? 0, cell.length)));
  return rows.map((row) =>
    `  ${row.map((cell, k) => cell + ' '.repeat(widths[k] - cell.length)).join('  ')}`.trimEnd(),
  );
}
