// An outline's points as a table: a paste of two columns (x and y) from a
// spreadsheet replaces a shape's points in one step.
import Papa from 'papaparse';
import { MAX_EDGES } from '../../document';
import type { Point, SketchFile } from '../sketchFile';
import { edgeNames } from '../geometry/polygon';
import { compactSurface } from './surfaceNames';
import { readNumber } from './numberInput';
import { replaceShape } from './shapeEdits';

/** Most points one paste may bring: one outline of the file's whole edge limit. */
export const MAX_PASTED_POINTS = MAX_EDGES;

/**
 * Points from pasted text: one point a line, x and y in the first two cells
 * (tab, comma or semicolon between them, as spreadsheets copy). A first line
 * that is not numbers is taken as a header and skipped. Rows are numbered from 1 in problems.
 */
export function readPointColumns(text: string): { points: Point[] } | { problem: string } {
  const delimiter = text.includes('\t') ? '\t' : text.includes(';') ? ';' : ',';
  const rows = Papa.parse<string[]>(text.trim(), { delimiter, skipEmptyLines: true }).data;
  const points: Point[] = [];
  for (let i = 0; i < rows.length; i++) {
    const cells = rows[i].map((c) => c.trim()).filter((c) => c !== '');
    if (cells.length < 2) return { problem: `line ${i + 1} needs two numbers, x and y` };
    const x = readNumber(cells[0], { min: -1e100, max: 1e100 });
    const y = readNumber(cells[1], { min: -1e100, max: 1e100 });
    if (!x.ok || !y.ok) {
      if (i === 0 && points.length === 0) continue; // a header row
      return { problem: `line ${i + 1}: ${!x.ok ? `x ${x.problem}` : `y ${(y as { problem: string }).problem}`}` };
    }
    points.push([x.value, y.value]);
  }
  if (points.length < 3) return { problem: `an outline needs at least three points; the paste has ${points.length}` };
  if (points.length > MAX_PASTED_POINTS) return { problem: `at most ${MAX_PASTED_POINTS} points can be pasted` };
  return { points };
}

/**
 * Replace a shape's points. Edges keep their names where they still exist; new
 * edges take the name of the last edge (a one-surface shape stays one surface).
 */
export function setShapePoints(doc: SketchFile, shapeIndex: number, points: Point[]): SketchFile {
  const shape = doc.shapes[shapeIndex];
  if (!shape) return doc;
  const names = edgeNames(shape);
  const surface = points.map((_, k) => names[Math.min(k, names.length - 1)]);
  return replaceShape(doc, shapeIndex, { ...shape, points, surface: compactSurface(surface) });
}
