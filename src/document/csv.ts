// CSV for spreadsheets: RFC 4180 quoting with CRLF line ends, and text cells
// that a spreadsheet would run as a formula (=, +, -, @, tab, carriage return
// first) prefixed with an apostrophe. Numbers are written in full precision.
import Papa from 'papaparse';

export type CsvCell = string | number;

// papaparse's own escapeFormulae pattern (/^[=+\-@\t\r].*$/) misses names with
// a line break after the first character, so pass a pattern that only looks at the first.
const FORMULA_START = /^[=+\-@\t\r]/;

export function toCsv(rows: readonly (readonly CsvCell[])[]): string {
  return `${Papa.unparse(
    rows.map((r) => [...r]),
    { quotes: false, newline: '\r\n', escapeFormulae: FORMULA_START },
  )}\r\n`;
}

/** A square matrix (row-major, row = from) with a header row and a first column of names. */
export function matrixCsv(names: readonly string[], matrix: ArrayLike<number>, corner = 'from \\ to'): string {
  const n = names.length;
  const rows: CsvCell[][] = [[corner, ...names]];
  for (let i = 0; i < n; i++) {
    const row: CsvCell[] = [names[i]];
    for (let j = 0; j < n; j++) row.push(matrix[i * n + j]);
    rows.push(row);
  }
  return toCsv(rows);
}
