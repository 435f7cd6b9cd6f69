// One part of the panel's study: its state, and starting and stopping it.
// The run itself lives in src/state/study/runs.ts, so it goes on while another tab is open.
import { startStudyRun, stopStudyRun, useStudyPart, type StudyPart, type StudyRequest } from '../../state/study';

export function useStudyRun(part: StudyPart) {
  const state = useStudyPart(part);
  return {
    ...state,
    start: (request: StudyRequest, doc: unknown) => startStudyRun(part, request, doc),
    stop: () => stopStudyRun(part),
  };
}
