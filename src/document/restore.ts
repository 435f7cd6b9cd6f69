// The one way in for a sketch: file text, a pasted document, an autosave.
// Never throws; a refused document comes back as problems: short messages that
// say what is wrong and where (shapes, points and edges counted from 1), each
// with the place it concerns as data (counted from 0) for the canvas.
import { checkCircles } from '../core/arc/circleChecks';
import { checkSketchGeometry } from '../core/sketchChecks';
import type { PolygonInput } from '../core/scene';
import { circleProblem, renumberFinding, splitShapes } from './circles';
import { geometryProblem } from './geometryMessages';
import { plainName } from './labels';
import { parseJsonText } from './jsonText';
import { MAX_EDGES, MAX_MESSAGES, MAX_SURFACES } from './limits';
import { migrate } from './migrate';
import { normalise } from './normalise';
import { mergePlaces, problemAt, type SketchProblem } from './problems';
import { parseSketchFile } from './plainKeys';
import type { Sketch, SketchFileV1 } from './schema';
import { rowProblems } from './rows/check';
import { schemaProblem } from './zodMessages';
import { surfaceIndex } from './surfaceIndex';
import { unknownFieldWarnings } from './unknownFields';

export type RestoreResult = { ok: true; sketch: Sketch; warnings: string[] } | { ok: false; errors: SketchProblem[] };

/**
 * A document read as a draft: the file format is right (JSON, version, schema),
 * but the sketch may break a rule of its own (crossing outlines, overlapping
 * bodies, a surface list of the wrong length, a coordinate out of range). `doc` is the
 * sketch as written (normalised when `problems` is empty); `problems` are what
 * `restore` would refuse it for, with their places.
 */
export type DraftResult =
  | { ok: true; doc: SketchFileV1; problems: SketchProblem[]; warnings: string[] }
  | { ok: false; errors: SketchProblem[] };

/** A document read both ways at once: as `restore` reads it and as `readDraft` does. */
export interface SketchReading {
  restored: RestoreResult;
  draft: DraftResult;
}

/**
 * Read a sketch from JSON text or from an already-parsed value; validate it
 * against the file format, bring older versions up to date, normalise it
 * (one surface name per edge, repeated consecutive points removed) and check
 * its geometry. Warnings describe repairs and ignored content.
 */
export function restore(input: unknown): RestoreResult {
  return readSketch(input).restored;
}

/**
 * Read a sketch the way the app opens one: everything `restore` reads, and also
 * a sketch whose file format is right but whose drawing breaks a rule, as a
 * draft with its problems (so a sketch saved mid-edit opens again as it was).
 * Refuses only what is not a sketch file at all (not JSON, wrong version,
 * fields of the wrong type) or is past the file-size or edge limit.
 */
export function readDraft(input: unknown): DraftResult {
  return readSketch(input).draft;
}

/**
 * `restore` and `readDraft` of one document from one reading (the app asks both
 * about every edit: its results and its autosave; the checks are the costly part).
 */
export function readSketch(input: unknown): SketchReading {
  const read = guarded(() => readFormat(input));
  if (!read.ok) return { restored: read, draft: read };
  const checked = guarded(() => checkSketch(read.doc));
  if ('errors' in checked) return { restored: checked, draft: checked }; // a fault in the checks: neither reads
  if (!checked.ok) {
    const problems = refuse(checked.problems).errors;
    return {
      restored: { ok: false, errors: problems },
      draft: { ok: true, doc: read.doc, problems, warnings: read.warnings },
    };
  }
  const warnings = [...read.warnings, ...checked.warnings];
  return {
    restored: { ok: true, sketch: checked.sketch, warnings },
    draft: { ok: true, doc: checked.sketch, problems: [], warnings },
  };
}

function guarded<T>(
  read: () => T | { ok: false; errors: SketchProblem[] },
): T | { ok: false; errors: SketchProblem[] } {
  try {
    return read();
  } catch (error) {
    // A fault here is a bug, but the caller (app or command line) must still get a message, not an exception.
    const detail = error instanceof Error ? error.message.split('\n', 1)[0].slice(0, 200) : String(error).slice(0, 200);
    return { ok: false, errors: [problemAt('internal', `could not read the sketch (internal error: ${detail})`)] };
  }
}

type FormatRead = { ok: true; doc: SketchFileV1; warnings: string[] } | { ok: false; errors: SketchProblem[] };

/** From text or value to a schema-valid document, or the reasons it is not a sketch file. */
function readFormat(input: unknown): FormatRead {
  let value = input;
  if (typeof input === 'string') {
    const parsed = parseJsonText(input);
    if (!parsed.ok) return refuse([problemAt('json', parsed.error)]);
    value = parsed.value;
  }
  const kind = notASketch(value);
  if (kind) return refuse([problemAt('not-a-sketch', kind)]);
  const migrated = migrate(value as Record<string, unknown>);
  if (!migrated.ok) return refuse([problemAt('version', migrated.error)]);
  const doc = migrated.doc;

  // Refused before the schema runs, so a huge file is turned away quickly. Not
  // even a draft: the canvas could not draw it (the app warns when a sketch grows past it).
  const limit = edgeLimitProblem(doc.shapes);
  if (limit) return refuse([limit]);

  const rows = doc.rows;
  if (rows !== null && typeof rows === 'object' && Object.hasOwn(rows, '__proto__')) {
    // Row names are keys the program writes with plain assignment; the schema would drop this one silently.
    return refuse([
      problemAt('schema', `rows: the name '__proto__' must not be "__proto__" (a reserved word); choose another name`),
    ]);
  }
  const parsed = parseSketchFile(doc);
  if (!parsed.success) return refuse(parsed.issues.map((issue) => schemaProblem(issue, doc)));
  return { ok: true, doc: parsed.data, warnings: unknownFieldWarnings(doc) };
}

type SketchCheck = { ok: true; sketch: Sketch; warnings: string[] } | { ok: false; problems: SketchProblem[] };

/** The rules of a drawing: one name per edge, coordinate range, edge lengths, geometry. */
function checkSketch(doc: SketchFileV1): SketchCheck {
  const normalised = normalise(doc);
  if (normalised.errors.length > 0) return { ok: false, problems: normalised.errors };
  const { sketch, fileIndex, filePointCount } = normalised;
  const surfaceCount = surfaceIndex(sketch.shapes).names.length;
  if (surfaceCount > MAX_SURFACES) {
    const why = 'the surface factors and the heat exchange grow with the square of the surface count';
    const message = `the sketch has ${surfaceCount} surfaces; the limit is ${MAX_SURFACES} (${why})`;
    return { ok: false, problems: [problemAt('limit', message)] };
  }

  const rows = rowProblems(sketch.shapes, doc);
  if (rows.length > 0) return { ok: false, problems: rows };

  const { polygons, circles } = splitShapes(sketch.shapes);
  const polygonInputs: PolygonInput[] = polygons.map((p) => p.polygon);
  const shapeOf = polygons.map((p) => p.shape);
  const findings = checkSketchGeometry(polygonInputs).map((f) => renumberFinding(f, shapeOf));
  if (findings.length > 0) {
    const ctx = { shapes: sketch.shapes, fileShapes: doc.shapes, fileIndex, filePointCount };
    return { ok: false, problems: findings.map((f) => geometryProblem(f, ctx)) };
  }
  const circleFindings = checkCircles(polygons, circles);
  if (circleFindings.length > 0)
    return { ok: false, problems: circleFindings.map((f) => circleProblem(f, doc.shapes, fileIndex, sketch.shapes)) };
  return { ok: true, sketch, warnings: normalised.warnings };
}

function edgeLimitProblem(shapes: unknown): SketchProblem | null {
  const shapeCount = Array.isArray(shapes) ? shapes.length : 0;
  if (shapeCount > MAX_EDGES / 3) {
    return problemAt(
      'limit',
      `the sketch has ${shapeCount} shapes; the limit is ${MAX_EDGES} edges in all, and each shape has at least 3`,
    );
  }
  const edges = countEdges(shapes);
  if (edges > MAX_EDGES) {
    return problemAt(
      'limit',
      `the sketch has ${edges} edges; the limit is ${MAX_EDGES} (the work grows with the square of the edge count)`,
    );
  }
  return null;
}

/**
 * At most MAX_MESSAGES problems, one per message; past that the last counts
 * the rest, and its place covers theirs so the canvas still marks every one.
 */
function refuse(problems: SketchProblem[]): { ok: false; errors: SketchProblem[] } {
  // One entry per message; a repeated message adds its place to the first.
  const byMessage = new Map<string, SketchProblem>();
  for (const p of problems) {
    const first = byMessage.get(p.message);
    byMessage.set(p.message, first ? { ...first, place: mergePlaces([first.place, p.place]) } : p);
  }
  const unique = [...byMessage.values()];
  if (unique.length <= MAX_MESSAGES) return { ok: false, errors: unique };
  const rest = unique.slice(MAX_MESSAGES - 1);
  const more = problemAt('more', `…and ${rest.length} more problems`, mergePlaces(rest.map((p) => p.place)));
  return { ok: false, errors: [...unique.slice(0, MAX_MESSAGES - 1), more] };
}
/** A message when the value is plainly not a sketch document (another kind of file), else null. */
function notASketch(value: unknown): string | null {
  const expected = 'a Tautline sketch is a JSON object with "version", "units" and "shapes"';
  if (value === null || typeof value !== 'object') {
    return `not a Tautline sketch: the file holds ${value === null ? 'null' : `a single ${typeof value}`}; ${expected}`;
  }
  if (Array.isArray(value)) return `not a Tautline sketch: the file holds a list; ${expected}`;
  const keys = Object.keys(value);
  if (!keys.includes('version') && !keys.includes('shapes')) {
    const found =
      keys.length === 0
        ? 'an empty object'
        : `fields ${keys
            .slice(0, 4)
            .map((k) => JSON.stringify(plainName(k, 40)))
            .join(', ')}${keys.length > 4 ? ', …' : ''}`;
    return `not a Tautline sketch: found ${found}; ${expected}`;
  }
  return null;
}

/** Edges the document would have (points per shape), counted before the schema runs so a huge file is refused quickly. */
function countEdges(shapes: unknown): number {
  if (!Array.isArray(shapes)) return 0;
  let total = 0;
  for (const s of shapes) {
    const { points, circle, surface } = (s ?? {}) as { points?: unknown; circle?: unknown; surface?: unknown };
    if (Array.isArray(points)) total += points.length;
    // A circle has one edge (arc) per surface name.
    if (circle !== undefined) total += Array.isArray(surface) ? surface.length : 1;
  }
  return total;
}
