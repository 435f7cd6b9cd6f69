// Building a tube row's tubes from its numbers, and breaking a row into single
// tubes. Both are pure: document in, document out. A tube that is still in
// the row keeps its surface names and properties; a new tube gets the next
// free generated name ("tube 9" is never given while a "tube 9" exists) and
// the properties of the row's last tube, as the rest of the row carries the
// same fluid; a removed tube's properties go with it.
import type { Point, ShapeV1, SketchFileV1, SurfaceProperties, TubeRow } from '../schema';
import { rowCentres } from './place';
import { setOwn } from '../ownRecord';

export type RowBuild = { ok: true; doc: SketchFileV1; tubes: number[] } | { ok: false; problem: string };

/** The indices of the shapes tagged with row `name`, in file order. */
export function rowTubes(shapes: readonly Pick<ShapeV1, 'row'>[], name: string): number[] {
  return shapes.flatMap((s, k) => (s.row === name ? [k] : []));
}

const names = (s: ShapeV1): string[] => (typeof s.surface === 'string' ? [s.surface] : s.surface);
const numbered = /^(.*) (\d+)$/;

/** "stem N" with N above every N in use with that stem. */
export function nextNumberedName(stem: string, taken: ReadonlySet<string>): string {
  let top = 0;
  for (const name of taken) {
    const m = numbered.exec(name);
    if (m && m[1] === stem) top = Math.max(top, Number(m[2]));
  }
  return `${stem} ${top + 1}`;
}

/** A row name not yet used: "row 1", "row 2", ... */
export function newRowName(doc: Pick<SketchFileV1, 'rows'>): string {
  return nextNumberedName('row', new Set(Object.keys(doc.rows ?? {})));
}

/**
 * The document with row `name` set to `row` and its tubes rebuilt: exact
 * circles at the row's centres, the first tubes reusing the shapes already
 * tagged (in file order), extra ones appended at the end of the shapes, surplus
 * ones removed. Refused (with the reason) when the row cannot be placed.
 */
export function buildRow(doc: SketchFileV1, name: string, row: TubeRow): RowBuild {
  const placed = rowCentres(doc.shapes, row);
  if (!placed.ok) return placed;
  const radius = row.diameter / 2;
  const old = rowTubes(doc.shapes, name);
  const kept = new Set(old.slice(0, row.count));
  const dropped = new Set(old.slice(row.count));
  const template = old.length > 0 ? names(doc.shapes[old[Math.min(old.length, row.count) - 1]]) : [];

  const surfaces: Record<string, SurfaceProperties> = { ...(doc.surfaces ?? {}) };
  const shapes: ShapeV1[] = [];
  let k = 0;
  doc.shapes.forEach((s, index) => {
    if (dropped.has(index)) return;
    if (!kept.has(index)) {
      shapes.push(s);
      return;
    }
    const center: Point = placed.centres[k++];
    shapes.push({ ...s, kind: 'solid', points: [], circle: { center, radius }, row: name });
  });

  // Names and properties: removed tubes take theirs along (unless another edge still uses the name).
  const used = new Set(shapes.flatMap(names));
  for (const i of dropped) for (const n of names(doc.shapes[i])) if (!used.has(n)) delete surfaces[n];

  const tubes = shapes.flatMap((s, i) => (s.row === name ? [i] : []));
  const copied = template.length > 0 && Object.hasOwn(surfaces, template[0]) ? surfaces[template[0]] : undefined;
  for (; k < row.count; k++) {
    const surface = nextNumberedName('tube', used);
    used.add(surface);
    if (copied) setOwn(surfaces, surface, { ...copied });
    tubes.push(shapes.length);
    shapes.push({ kind: 'solid', points: [], circle: { center: placed.centres[k], radius }, surface, row: name });
  }
  const next: SketchFileV1 = { ...doc, shapes, rows: { ...(doc.rows ?? {}), [name]: row } };
  if (Object.keys(surfaces).length > 0 || doc.surfaces) next.surfaces = surfaces;
  return { ok: true, doc: next, tubes };
}

/** The document with row `name` broken into single tubes: the row and its tags removed, every tube kept where it is. */
export function splitRow(doc: SketchFileV1, name: string): SketchFileV1 {
  if (!doc.rows || !Object.hasOwn(doc.rows, name)) return doc;
  const rest = Object.fromEntries(Object.entries(doc.rows).filter(([n]) => n !== name));
  const shapes = doc.shapes.map((s) => {
    if (s.row !== name) return s;
    const single = { ...s };
    delete single.row;
    return single;
  });
  const next: SketchFileV1 = { ...doc, shapes };
  if (Object.keys(rest).length > 0) next.rows = rest;
  else delete next.rows;
  return next;
}
