// The exchange results beyond the net heat, as rows for the exchange tab: the
// net exchange matrix q'_ij (W per metre of depth, from row to column, with the
// surroundings of an open sketch as a last column) and each surface's radiosity
// and irradiation (W/m^2); and every table as tab-separated text for a spreadsheet.
import Papa from 'papaparse';
import { seesSurroundings, SURROUNDINGS_LABEL } from './labels';
import { solvedCsv } from './export';
import type { ExchangeSolved } from './slice';

export interface ExchangeMatrixRows {
  /** Row names (the surfaces). */
  names: string[];
  /** Column names: the surfaces, then the surroundings in an open sketch. */
  columns: string[];
  /** Net heat from surface i to column j, W per metre of depth (read from the result: nothing is copied). */
  at(i: number, j: number): number;
}

export interface RadiosityRow {
  name: string;
  /** Radiosity J, W/m^2. */
  radiosity: number;
  /** Irradiation G, W/m^2. */
  irradiation: number;
}

const matrices = new WeakMap<ExchangeSolved['result'], ExchangeMatrixRows>();

/** The net exchange matrix of a solved exchange (cached per result). */
export function exchangeMatrixRows(ex: ExchangeSolved): ExchangeMatrixRows {
  const hit = matrices.get(ex.result);
  if (hit) return hit;
  const r = ex.result;
  const n = r.surfaceCount;
  const open = seesSurroundings(r);
  // Cells are read where they are: a windowed table shows a few hundred of n^2.
  const at = (i: number, j: number) => (j < n ? r.exchange[i * n + j] : r.surroundingsExchange[i]);
  const view = { names: ex.names, columns: open ? [...ex.names, SURROUNDINGS_LABEL.name] : ex.names, at };
  matrices.set(ex.result, view);
  return view;
}

/** Radiosity and irradiation per surface. */
export function radiosityRows(ex: ExchangeSolved): RadiosityRow[] {
  const r = ex.result;
  return ex.names.map((name, i) => ({ name, radiosity: r.radiosity[i], irradiation: r.irradiation[i] }));
}

/** A name as a spreadsheet cell: no tabs or line breaks, and not run as a formula (as the CSV does). */
function safeCell(name: string): string {
  const flat = name.replace(/[\t\r\n]+/g, ' ');
  return /^[=+\-@\t\r]/.test(name) ? `'${flat}` : flat;
}

/** Rows of cells as tab-separated text (names made safe, numbers in full precision). */
export function toTsv(rows: ReadonlyArray<ReadonlyArray<string | number>>): string {
  return (
    rows.map((row) => row.map((c) => (typeof c === 'number' ? String(c) : safeCell(c))).join('\t')).join('\n') + '\n'
  );
}

/** The exchange matrix as tab-separated text, header row and first column of names. */
export function exchangeMatrixTsv(ex: ExchangeSolved): string {
  const m = exchangeMatrixRows(ex);
  return toTsv([
    ["q' from \\ to (W/m)", ...m.columns],
    ...m.names.map((name, i) => [name, ...m.columns.map((_, j) => m.at(i, j))]),
  ]);
}

/** Radiosity and irradiation as tab-separated text. */
export function radiosityTsv(ex: ExchangeSolved): string {
  return toTsv([
    ['surface', 'radiosity (W/m^2)', 'irradiation (W/m^2)'],
    ...radiosityRows(ex).map((r) => [r.name, r.radiosity, r.irradiation]),
  ]);
}

/** The net heat table as tab-separated text: the CSV export's columns and numbers (so new columns follow it). */
export function netHeatTsv(ex: ExchangeSolved): string {
  const parsed = Papa.parse<string[]>(solvedCsv(ex), { skipEmptyLines: true });
  // The CSV has already made names safe for a spreadsheet; keep its cells as they are, tabs and breaks flattened.
  return parsed.data.map((row) => row.map((c) => c.replace(/[\t\r\n]+/g, ' ')).join('\t')).join('\n') + '\n';
}
