// Study results as rows: one per value of the parameter, with every surface's
// net heat and temperature, the units in the header. The command line's CSV
// and table and the app's table and download all read these rows.
import { toCsv, type CsvCell } from '../csv';
import type { Units } from '../units';
import { describeParameter, parameterUnit, type StudyParameter } from './parameter';

/** What a row needs of a run (a StudyRun has it; so do the app's shares of a sweep put together). */
export interface SweepRowSource {
  value: number;
  names: readonly string[];
  result: { netHeat: ArrayLike<number>; temperature: ArrayLike<number> };
}

/** What the rows need of a case, and no more (a whole run also holds its surfaces^2 exchange matrix). */
export function sweepRowOf(run: SweepRowSource): SweepRowSource {
  return {
    value: run.value,
    names: run.names,
    result: { netHeat: run.result.netHeat, temperature: run.result.temperature },
  };
}

/** Header and one row per run: the value, then net heat (W per metre of depth) and temperature (K) of each surface. */
export function sweepRows(p: StudyParameter, units: Units, runs: readonly SweepRowSource[]): CsvCell[][] {
  const unit = parameterUnit(p, units);
  const names = runs[0]?.names ?? [];
  const header: CsvCell[] = [unit === '' ? describeParameter(p) : `${describeParameter(p)} (${unit})`];
  for (const name of names) header.push(`${name}: net heat (W/m)`, `${name}: temperature (K)`);
  const rows: CsvCell[][] = [header];
  for (const run of runs) {
    const row: CsvCell[] = [run.value];
    names.forEach((_, i) => row.push(run.result.netHeat[i], run.result.temperature[i]));
    rows.push(row);
  }
  return rows;
}

/** The rows as CSV (RFC 4180, spreadsheet-safe names). */
export function sweepCsv(p: StudyParameter, units: Units, runs: readonly SweepRowSource[]): string {
  return toCsv(sweepRows(p, units, runs));
}
