// The heat-exchange results as CSV, one writer for the command line and the app.
import { emissivePower } from '../core/exchange';
import type { BalanceCondition, BalanceResult } from '../core/balance';
import { toCsv, type CsvCell } from './csv';
import { CONDITION_LABEL, GAS_LABEL, SURROUNDINGS_LABEL, hasGas, seesSurroundings } from './exchange/labels';
import type { Units } from './units';

// Where the app's state layer reads the table labels (one set of words for the command line and the app).
export {
  CONDITION_LABEL,
  GAS_LABEL,
  SURROUNDINGS_LABEL,
  conditionInTable,
  hasGas,
  seesSurroundings,
} from './exchange/labels';

export interface ExchangeReport {
  /** Units of the lengths (the sketch file's). */
  units: Units;
  names: ReadonlyArray<string>;
  /** Surface lengths in `units`. */
  surfaceLength: ArrayLike<number>;
  result: BalanceResult;
  conditions: ReadonlyArray<BalanceCondition>;
}

/** Temperatures through a wall, hot face first, as one cell: "1188.5 973.28 364.95" (K). */
export function layerTemperaturesCell(t: Float64Array | undefined): string {
  return t ? Array.from(t, (v) => String(Number(v.toPrecision(8)))).join(' ') : '';
}

/**
 * One row per surface (and one for the surroundings of an open sketch, one for
 * the gas when it has a temperature), units in the header: length (file
 * units), emissivity, condition, temperature (K), net heat by radiation,
 * convection heat and supplied heat (W per metre of depth), net flux and
 * radiosity (W/m^2); with walls the cold-face and layer temperatures (K), with
 * tubes the inner wall temperature (K); with a depth the total net heat (W).
 * Spreadsheet-safe (RFC 4180 quoting, formula-like names neutralised).
 */
export function exchangeCsv({ units, names, surfaceLength, result: r, conditions }: ExchangeReport): string {
  const withDepth = r.depth !== undefined;
  const walls = conditions.some((c) => c.kind === 'wall');
  const tubes = conditions.some((c) => c.kind === 'tube');
  const header: CsvCell[] = [
    'surface',
    `length (${units})`,
    'emissivity',
    'condition',
    'temperature (K)',
    'net heat (W/m)',
    'net flux (W/m^2)',
    'radiosity (W/m^2)',
    'convection heat (W/m)',
    'supplied heat (W/m)',
    ...(walls ? ['cold face temperature (K)', 'layer temperatures (K)'] : []),
    ...(tubes ? ['inner temperature (K)'] : []),
    ...(withDepth ? [`net heat total (W) over ${r.depth} m`] : []),
  ];
  const rows: CsvCell[][] = [header];
  const blankExtras = (): CsvCell[] => [...(walls ? ['', ''] : []), ...(tubes ? [''] : [])];
  names.forEach((name, i) => {
    rows.push([
      name,
      surfaceLength[i],
      r.emissivity[i],
      CONDITION_LABEL[conditions[i].kind],
      r.temperature[i],
      r.netHeat[i],
      r.netFlux[i],
      r.radiosity[i],
      r.convectionHeat[i],
      r.suppliedHeat[i],
      ...(walls
        ? conditions[i].kind === 'wall'
          ? [r.coldFaceTemperature[i], layerTemperaturesCell(r.layerTemperatures[i])]
          : ['', '']
        : []),
      ...(tubes ? [conditions[i].kind === 'tube' ? r.innerTemperature[i] : ''] : []),
      ...(withDepth ? [r.netHeatTotal![i]] : []),
    ]);
  });
  if (seesSurroundings(r)) {
    const Ts = r.surroundingsTemperature!;
    rows.push([
      SURROUNDINGS_LABEL.name,
      '',
      1,
      SURROUNDINGS_LABEL.condition,
      Ts,
      r.surroundingsNetHeat,
      '',
      emissivePower(Ts),
      0,
      r.surroundingsNetHeat,
      ...blankExtras(),
      ...(withDepth ? [r.surroundingsNetHeatTotal!] : []),
    ]);
  }
  if (hasGas(r)) {
    rows.push([
      GAS_LABEL.name,
      '',
      '',
      GAS_LABEL.condition,
      r.gasTemperature!,
      '',
      '',
      '',
      r.gasConvectionHeat,
      r.gasConvectionHeat,
      ...blankExtras(),
      ...(withDepth ? [''] : []),
    ]);
  }
  return toCsv(rows);
}
