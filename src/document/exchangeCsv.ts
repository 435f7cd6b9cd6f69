// The heat-exchange results as CSV, one writer for the command line and the app.
import { emissivePower, type ExchangeResult, type SurfaceCondition } from '../core/exchange';
import { toCsv, type CsvCell } from './csv';
import { CONDITION_LABEL, SURROUNDINGS_LABEL, seesSurroundings } from './exchange/labels';
import type { Units } from './units';

// Where the app's state layer reads the table labels (one set of words for the command line and the app).
export { CONDITION_LABEL, SURROUNDINGS_LABEL, conditionInTable, seesSurroundings } from './exchange/labels';

export interface ExchangeReport {
  /** Units of the lengths (the sketch file's). */
  units: Units;
  names: ReadonlyArray<string>;
  /** Surface lengths in `units`. */
  surfaceLength: ArrayLike<number>;
  result: ExchangeResult;
  conditions: ReadonlyArray<SurfaceCondition>;
}

/**
 * One row per surface (and one for the surroundings of an open sketch), units in
 * the header: length (file units), emissivity, condition, temperature (K), net heat
 * (W per metre of depth), net flux and radiosity (W/m^2), and with a depth the total (W).
 * Spreadsheet-safe (RFC 4180 quoting, formula-like names neutralised).
 */
export function exchangeCsv({ units, names, surfaceLength, result: r, conditions }: ExchangeReport): string {
  const withDepth = r.depth !== undefined;
  const header: CsvCell[] = [
    'surface',
    `length (${units})`,
    'emissivity',
    'condition',
    'temperature (K)',
    'net heat (W/m)',
    'net flux (W/m^2)',
    'radiosity (W/m^2)',
    ...(withDepth ? [`net heat total (W) over ${r.depth} m`] : []),
  ];
  const rows: CsvCell[][] = [header];
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
      ...(withDepth ? [r.surroundingsNetHeatTotal!] : []),
    ]);
  }
  return toCsv(rows);
}
