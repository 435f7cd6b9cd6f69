// The sketch file: schema (version 1), reading, writing, and CSV export.
export { restore, readDraft, readSketch, type RestoreResult, type DraftResult, type SketchReading } from './restore';
export { serialize } from './serialize';
export { toScene } from './toScene';
export { toCsv, matrixCsv, type CsvCell } from './csv';
export { CURRENT_VERSION, sketchFileSchemaV1 } from './schema';
export type {
  Sketch,
  Shape,
  ShapeKind,
  Point,
  SurfaceProperties,
  SketchSettings,
  SketchFileV1,
  ShapeV1,
  TubeRow,
} from './schema';
export { UNITS, METRES_PER_UNIT, type Units } from './units';
export {
  MAX_EDGES,
  MAX_SURFACES,
  MAX_COORDINATE,
  MIN_EDGE_LENGTH,
  MIN_RELATIVE_EDGE_LENGTH,
  MAX_NAME_LENGTH,
  MAX_FILE_CHARS,
  MAX_JSON_DEPTH,
} from './limits';
export type { SketchProblem, ProblemPlace, ProblemKind } from './problems';
