// The studies panel's state-side functions: what can be varied, running a
// study (worker or in-line), and the plot's scales.
export { studyChoices, suggestedRange, type StudyChoice } from './choices';
export {
  runStudy,
  type EffectsTable,
  type SolveAnswer,
  type StudyReply,
  type StudyRequest,
  type SweepTable,
} from './run';
export { startStudy, type RunningStudy } from './start';
export { withKnownFactors } from './pipelineFactors';
export { QUANTITIES, QUANTITY_UNIT, type Quantity } from '../../document/study';
export {
  resetStudies,
  startStudyRun,
  stopStudyRun,
  useStudyField,
  useStudyPart,
  type FinalReply,
  type PartState,
  type StudyPart,
} from './runs';
