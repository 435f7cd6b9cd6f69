// Design studies of a sketch: sweeps, solving for a target, and sensitivity
// tables, with every message worded here.
export {
  QUANTITIES,
  QUANTITY_UNIT,
  SETTINGS,
  ROW_MEASURES,
  SHAPE_MEASURES,
  SURFACE_PROPERTIES,
  describeParameter,
  describeQuantity,
  parameterProblem,
  parameterRefusal,
  parameterUnit,
  parseParameter,
  parseTarget,
  type Quantity,
  type StudyParameter,
  type StudyTarget,
} from './parameter';
export { parameterValue, withParameterValue } from './apply';
export { caseFactors, editedSketch, studyRunner, type StudyRun, type StudyRunOutcome, type ViewFactorsOf } from './run';
export {
  MAX_STUDY_STEPS,
  rangeProblem,
  runSweep,
  sweepShare,
  type SweepOutcome,
  type SweepShare,
  type SweepShareOutcome,
} from './sweep';
export { DEFAULT_SCAN_STEPS, solveForTarget, targetQuantity, type SolveForOutcome } from './solveFor';
export { sweepCsv, sweepRowOf, sweepRows, type SweepRowSource } from './tables';
export { studyFaultMessage, type StudyFault } from './faults';
export { sensitivityTable, type SensitivityRow, type SensitivityTableOutcome } from './sensitivity';
export {
  MAX_RANGES,
  emissivityBounds,
  parseEmissivityRange,
  type EmissivityBounds,
  type EmissivityRange,
} from './bounds';
