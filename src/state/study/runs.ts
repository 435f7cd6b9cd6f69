// The panel's studies outlive the panel: a run goes on, and its result and the
// fields typed stay, while another tab is open. One running study per part of
// the panel ('sweep', 'aim', 'effects'); starting one stops the one before it.
import { createStore, useStore } from 'zustand';
import { startStudy, type RunningStudy } from './start';
import type { StudyReply, StudyRequest } from './run';

export type StudyPart = 'sweep' | 'aim' | 'effects';
export type FinalReply = Exclude<StudyReply, { kind: 'progress' }>;

export interface PartState {
  busy: boolean;
  progress: { done: number; total: number } | null;
  /** The last reply, and the document it was run on (to say when the sketch has changed since). */
  final: { reply: FinalReply; doc: unknown } | null;
}

interface StudyRuns {
  parts: Record<StudyPart, PartState>;
  /** What was typed in the panel's fields, by field name. */
  fields: Record<string, string>;
}

const idle: PartState = { busy: false, progress: null, final: null };
const store = createStore<StudyRuns>(() => ({ parts: { sweep: idle, aim: idle, effects: idle }, fields: {} }));
const running = new Map<StudyPart, RunningStudy>();

function setPart(part: StudyPart, change: Partial<PartState>) {
  store.setState((s) => ({ parts: { ...s.parts, [part]: { ...s.parts[part], ...change } } }));
}

/** Stop the part's study, if one runs; its last result stays. */
export function stopStudyRun(part: StudyPart): void {
  running.get(part)?.stop();
  running.delete(part);
  setPart(part, { busy: false, progress: null });
}

/** Start a study for a part of the panel, on the document `doc` (kept to tell when results are stale). */
export function startStudyRun(part: StudyPart, request: StudyRequest, doc: unknown): void {
  stopStudyRun(part);
  setPart(part, { busy: true, progress: null, final: null });
  running.set(
    part,
    startStudy(request, (reply) => {
      if (reply.kind === 'progress') {
        setPart(part, { progress: { done: reply.done, total: reply.total } });
        return;
      }
      running.delete(part);
      setPart(part, { busy: false, progress: null, final: { reply, doc } });
    }),
  );
}

/** The part's state, for components. */
export function useStudyPart(part: StudyPart): PartState {
  return useStore(store, (s) => s.parts[part]);
}

/** A text field's value that survives the panel closing; `initial` until something is typed. */
export function useStudyField(name: string, initial: string): [string, (text: string) => void] {
  const value = useStore(store, (s) => s.fields[name]);
  return [value ?? initial, (text) => store.setState((s) => ({ fields: { ...s.fields, [name]: text } }))];
}

/** Stop everything and forget results and fields (a new document, tests). */
export function resetStudies(): void {
  for (const part of running.keys()) stopStudyRun(part);
  store.setState({ parts: { sweep: idle, aim: idle, effects: idle }, fields: {} });
}
