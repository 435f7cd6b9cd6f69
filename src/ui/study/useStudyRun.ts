// One part of the panel's study: its state, and starting and stopping it.
// The run itself lives in src/state/study/runs.ts, so it goes on while another tab is open.
import {
  startStudyRun,
  stopStudyRun,
  useStudyPart,
  withKnownFactors,
  type StudyPart,
  type StudyRequest,
} from '../../state/study';
import { useAppStore } from '../AppContext';

export function useStudyRun(part: StudyPart) {
  const state = useStudyPart(part);
  const store = useAppStore();
  return {
    ...state,
    // The view factors on screen go with the study when they are the sketch's (pipelineFactors.ts).
    start: (request: StudyRequest, doc: unknown) =>
      startStudyRun(part, withKnownFactors(request, store.getState().viewFactors), doc),
    stop: () => stopStudyRun(part),
  };
}
