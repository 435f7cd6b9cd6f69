// Tube rows: a row's numbers in the file, its tubes built from them, and the
// rules a row keeps when read.
export { MAX_ROW_TUBES } from './limits';
export { directionOf, findWall, tidy, rowCentres, rowNumbersProblem, type RowShape, type Wall } from './place';
export { buildRow, newRowName, nextNumberedName, rowTubes, splitRow, type RowBuild } from './rebuild';
export { firstMismatch, rowProblems } from './check';
export type { TubeRow } from '../schema';
