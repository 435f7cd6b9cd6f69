// A stand-in for a browser study worker (tests of src/state/study): it runs the
// study on a timer in this thread and posts what the real worker posts.
import { runStudy, type StudyReply, type StudyRequest } from '../../src/state/study';
import type { StudyWorker } from '../../src/state/study/shares';

export class StandInWorker implements StudyWorker {
  onmessage: ((event: MessageEvent<StudyReply>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  terminated = false;
  /** `delay`: ms before it starts (a slow share). */
  constructor(private readonly delay = 0) {}
  postMessage(request: StudyRequest): void {
    setTimeout(() => {
      if (this.terminated) return;
      const post = (data: StudyReply) => {
        if (!this.terminated) this.onmessage?.({ data } as MessageEvent<StudyReply>);
      };
      post(runStudy(request, (done, total) => post({ kind: 'progress', done, total })));
    }, this.delay);
  }
  terminate(): void {
    this.terminated = true;
  }
}
