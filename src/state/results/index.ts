// The one results pipeline: document -> checked geometry -> edge view factors
// (worker) -> surface factors -> heat exchange (src/state/exchange) -> tables.
export { startLiveResults, type JobRunner } from './live';
export { shownResult, surfaceFactors, type ShownResult } from './derive';
export {
  createResultsSlice,
  type ResultsSlice,
  type ResultStatus,
  type ViewFactorCache,
  type EdgeStage,
} from './slice';
export { checkedGeometry, type CheckedGeometry } from './checked';
export { geometryKey, scaleBetween, type GeometryKey } from './geometry';
