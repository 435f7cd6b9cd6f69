// The report's heat exchange: the net heat per surface, the exchange matrix and
// the energy balance, printed as `npm run cli -- exchange FILE` prints them, and
// flux profiles along split walls. The per-surface table is a list of columns
// headed as the command line heads them, so a new result (say, convection) is
// one more entry in NET_HEAT_COLUMNS.
import type { SketchExchangeOutcome } from '../exchangeInput';
import { conditionInTable, GAS_LABEL, hasGas, SURROUNDINGS_LABEL, seesSurroundings } from '../exchange/labels';
import { GAS_CAUTION, WALL_TUBE_CAUTION, burnWarning } from '../exchange/cautions';
import { layerTemperaturesCell } from '../exchangeCsv';
import type { Units } from '../units';
import { escapeMarkup } from './escape';
import { kelvin2, residual, sig6 } from './format';
import type { WallProfile } from './profiles';
import { htmlTable, num, rowHead, text, type Cell } from './table';
import { MAX_MATRIX_SURFACES, SIGN_NOTE, matrixLeftOut } from './wording';

/** What solveSketchExchange gives (so the tables follow the solver's result as it grows). */
type Solved = Extract<SketchExchangeOutcome, { ok: true }>;

export interface SolvedExchange {
  names: ReadonlyArray<string>;
  units: Units;
  /** Surface lengths in `units`. */
  lengths: ArrayLike<number>;
  conditions: Solved['input']['conditions'];
  result: Solved['result'];
}

export interface SurfaceColumn {
  head: (ex: SolvedExchange) => string;
  /** Shown only when this says so (default: always). */
  when?: (ex: SolvedExchange) => boolean;
  /** The cell of surface i. */
  cell: (ex: SolvedExchange, i: number) => Cell;
  /** The cell of the surroundings row of an open sketch. */
  surroundings: (ex: SolvedExchange) => Cell;
  /** The cell of the gas row, when the sketch sets a gas temperature (default: blank). */
  gas?: (ex: SolvedExchange) => Cell;
}

const blank = () => text('');
const n6 = (x: number) => num(sig6(x), x);
const k2 = (x: number) => num(kelvin2(x), x);
const some = (ex: SolvedExchange, kind: string) => ex.conditions.some((c) => c.kind === kind);

/** The per-surface columns, in the command line's order. */
export const NET_HEAT_COLUMNS: SurfaceColumn[] = [
  { head: () => 'length', cell: (ex, i) => n6(ex.lengths[i]), surroundings: blank },
  { head: () => 'emissivity', cell: (ex, i) => n6(ex.result.emissivity[i]), surroundings: () => num('1', 1) },
  {
    head: () => 'condition',
    cell: (ex, i) => text(conditionInTable(ex.conditions[i].kind)),
    surroundings: () => text(SURROUNDINGS_LABEL.condition),
    gas: () => text(GAS_LABEL.condition),
  },
  {
    head: () => 'T (K)',
    cell: (ex, i) => num(kelvin2(ex.result.temperature[i]), ex.result.temperature[i]),
    surroundings: (ex) => k2(ex.result.surroundingsTemperature!),
    gas: (ex) => k2(ex.result.gasTemperature!),
  },
  {
    head: () => 'net heat (W/m)',
    cell: (ex, i) => n6(ex.result.netHeat[i]),
    surroundings: (ex) => n6(ex.result.surroundingsNetHeat),
  },
  { head: () => 'net flux (W/m²)', cell: (ex, i) => n6(ex.result.netFlux[i]), surroundings: blank },
  { head: () => 'radiosity (W/m²)', cell: (ex, i) => n6(ex.result.radiosity[i]), surroundings: blank },
  {
    head: () => 'convection (W/m)',
    cell: (ex, i) => n6(ex.result.convectionHeat[i]),
    surroundings: () => num('0', 0),
    gas: (ex) => n6(ex.result.gasConvectionHeat),
  },
  {
    head: () => 'supplied (W/m)',
    cell: (ex, i) => n6(ex.result.suppliedHeat[i]),
    surroundings: (ex) => n6(ex.result.surroundingsNetHeat),
    gas: (ex) => n6(ex.result.gasConvectionHeat),
  },
  {
    head: () => 'cold face (K)',
    when: (ex) => some(ex, 'wall'),
    cell: (ex, i) => (ex.conditions[i].kind === 'wall' ? k2(ex.result.coldFaceTemperature[i]) : blank()),
    surroundings: blank,
  },
  {
    head: () => 'layers (K)',
    when: (ex) => some(ex, 'wall'),
    cell: (ex, i) =>
      ex.conditions[i].kind === 'wall'
        ? { text: layerTemperaturesCell(ex.result.layerTemperatures[i]), wrap: true }
        : blank(),
    surroundings: blank,
  },
  {
    head: () => 'inner (K)',
    when: (ex) => some(ex, 'tube'),
    cell: (ex, i) => (ex.conditions[i].kind === 'tube' ? k2(ex.result.innerTemperature[i]) : blank()),
    surroundings: blank,
  },
  {
    head: (ex) => `total (W) over ${sig6(ex.result.depth!)} m`,
    when: (ex) => ex.result.depth !== undefined,
    cell: (ex, i) => n6(ex.result.netHeatTotal![i]),
    surroundings: (ex) => n6(ex.result.surroundingsNetHeatTotal!),
  },
];

function netHeatTable(ex: SolvedExchange): string {
  const columns = NET_HEAT_COLUMNS.filter((c) => c.when?.(ex) ?? true);
  const rows = ex.names.map((name, i) => [rowHead(name), ...columns.map((c) => c.cell(ex, i))]);
  const keys = [...ex.names];
  if (seesSurroundings(ex.result)) {
    rows.push([rowHead(SURROUNDINGS_LABEL.name), ...columns.map((c) => c.surroundings(ex))]);
    keys.push(SURROUNDINGS_LABEL.name);
  }
  if (hasGas(ex.result)) {
    // The gas row: its temperature and the heat it takes by convection (the command line's row).
    rows.push([rowHead(GAS_LABEL.name), ...columns.map((c) => c.gas?.(ex) ?? blank())]);
    keys.push(GAS_LABEL.name);
  }
  return htmlTable({
    name: 'net-heat',
    head: [text('surface'), ...columns.map((c) => text(c.head(ex)))],
    rows,
    rowKeys: keys,
  });
}

function exchangeMatrix(ex: SolvedExchange): string {
  const r = ex.result;
  const n = r.surfaceCount;
  if (n > MAX_MATRIX_SURFACES)
    return `<p class="note" data-left-out>${escapeMarkup(matrixLeftOut('exchange matrix', n, 'npm run cli -- exchange FILE --json'))}</p>`;
  const open = seesSurroundings(r);
  const head: Cell[] = [text('from \\ to'), ...ex.names.map(text)];
  if (open) head.push(text(SURROUNDINGS_LABEL.name));
  const rows = ex.names.map((name, i) => {
    const row: Cell[] = [rowHead(name)];
    for (let j = 0; j < n; j++) row.push(n6(r.exchange[i * n + j]));
    if (open) row.push(n6(r.surroundingsExchange[i]));
    return row;
  });
  return htmlTable({ name: 'exchange', className: 'matrix', head, rows, rowKeys: ex.names });
}

function profileTable(ex: SolvedExchange, p: WallProfile): string {
  const r = ex.result;
  const rows = p.parts.map(({ surface: i, position, length }) => [
    rowHead(ex.names[i]),
    n6(position),
    n6(length),
    num(kelvin2(r.temperature[i]), r.temperature[i]),
    n6(r.netFlux[i]),
    n6(r.netHeat[i]),
  ]);
  return htmlTable({
    name: `profile:${p.wall}`,
    caption: `${p.wall}: ${p.parts.length} parts, position of each part's middle from the start of the first`,
    head: [
      text('part'),
      text(`position (${ex.units})`),
      text(`length (${ex.units})`),
      text('T (K)'),
      text('net flux (W/m²)'),
      text('net heat (W/m)'),
    ],
    rows,
    rowKeys: p.parts.map((q) => ex.names[q.surface]),
  });
}

/** Net heat, exchange matrix and energy balance (main), and the profiles of split walls, of a solved sketch. */
export function exchangeSection(
  ex: SolvedExchange,
  profiles: ReadonlyArray<WallProfile>,
): { main: string; profiles: string } {
  const r = ex.result;
  const per =
    (r.depth === undefined ? 'per metre of depth' : `per metre of depth; totals over ${sig6(r.depth)} m`) +
    `; lengths in ${ex.units}`;
  const balance = `Energy balance: |sum of supplied heat, gas and surroundings| / sum of radiation leaving the surfaces = <span data-value="${r.energyBalance}" data-name="energy-balance">${residual(r.energyBalance)}</span>.`;
  // The command line's warnings and cautions for walls, tubes and gas, in the same words.
  const burns = ex.names.flatMap((name, i) =>
    ex.conditions[i].kind === 'wall' ? (burnWarning(name, r.coldFaceTemperature[i]) ?? []) : [],
  );
  const cautions = [
    ...burns.map((b) => `<p class="warning" role="alert"><strong>Warning:</strong> ${escapeMarkup(b)}.</p>`),
    ...(hasGas(r) ? [`<p class="note">${escapeMarkup(GAS_CAUTION)}</p>`] : []),
    ...(some(ex, 'wall') || some(ex, 'tube') ? [`<p class="note">${escapeMarkup(WALL_TUBE_CAUTION)}</p>`] : []),
  ].join('');
  const main = [
    `<section class="exchange"><h2>Heat exchange</h2><p class="note">Gray-diffuse, ${escapeMarkup(per)}.</p>`,
    netHeatTable(ex),
    `<h3>Net exchange q'<sub>ij</sub>, W per metre of depth, from row to column</h3>`,
    exchangeMatrix(ex),
    `<p class="note">${balance} ${escapeMarkup(SIGN_NOTE)}</p>${cautions}</section>`,
  ].join('');
  const tables = profiles.map((p) => profileTable(ex, p)).join('');
  return {
    main,
    profiles: tables && `<section class="profiles"><h2>Flux profiles along split walls</h2>${tables}</section>`,
  };
}
