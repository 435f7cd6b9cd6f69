// Study workers kept from one study to the next. A new worker loads its modules
// and runs its first cases unoptimised; one kept from the last study starts at
// once, its code compiled. Only a worker whose study ended with its final reply is
// kept (a stopped or failed one may be mid-case: it is ended), at most `most` at a
// time, each for `lingerMs` (an idle worker still holds its last sketch's scratch).
import type { StudyWorker } from './shares';

export class IdleWorkers {
  private readonly idle: { worker: StudyWorker; timer: ReturnType<typeof setTimeout> }[] = [];

  constructor(
    private readonly make: () => StudyWorker,
    private readonly most: number,
    private readonly lingerMs: number,
  ) {}

  /** The worker kept last, or a new one. */
  take(): StudyWorker {
    const kept = this.idle.pop();
    if (!kept) return this.make();
    clearTimeout(kept.timer);
    return kept.worker;
  }

  /** Keep a worker whose study has ended with its final reply; past `most` the oldest kept is ended. */
  giveBack(worker: StudyWorker): void {
    worker.onmessage = null;
    worker.onerror = null;
    const entry = {
      worker,
      timer: setTimeout(() => {
        const k = this.idle.indexOf(entry);
        if (k >= 0) this.idle.splice(k, 1);
        worker.terminate();
      }, this.lingerMs),
    };
    this.idle.push(entry);
    while (this.idle.length > this.most) {
      const oldest = this.idle.shift()!;
      clearTimeout(oldest.timer);
      oldest.worker.terminate();
    }
  }

  /** Workers kept now. */
  get size(): number {
    return this.idle.length;
  }
}
