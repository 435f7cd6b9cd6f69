// The wording of a study's internal faults in the app: its worker broke down, or
// the shares of a sweep (state/study/shares.ts) did not come back whole. Not the
// sketch's problems (those are worded with the case's value, run.ts).

export type StudyFault =
  /** The browser's own words for a worker that failed (may be empty). */
  | { kind: 'workerFailed'; detail: string }
  /** A share answered with something other than its part of the sweep. */
  | { kind: 'unexpectedReply'; reply: string }
  | { kind: 'noShare' }
  /** Case `index` (from 0) came back from no share. */
  | { kind: 'missingCase'; index: number };

/** The message the study shows for an internal fault. */
export function studyFaultMessage(fault: StudyFault): string {
  const detail =
    fault.kind === 'workerFailed'
      ? fault.detail || 'worker failed'
      : fault.kind === 'unexpectedReply'
        ? `a share of the sweep replied '${fault.reply}'`
        : fault.kind === 'noShare'
          ? 'no share of the sweep came back'
          : `case ${fault.index + 1} of the sweep is missing`;
  return `the study stopped with an internal error (${detail})`;
}
