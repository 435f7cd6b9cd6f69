// A stand-in for the view-factor worker: each job waits until the test answers,
// throws, or never answers (a hang).
import type { WorkerHandle } from '../../src/worker/client';
import type { EdgeViewFactors, ViewFactorAnswer, ViewFactorJob } from '../../src/worker/job';

export interface PendingCall {
  job: ViewFactorJob;
  resolve: (r: ViewFactorAnswer) => void;
  reject: (e: unknown) => void;
}

export class FakeWorker implements WorkerHandle {
  calls: PendingCall[] = [];
  terminated = false;
  private crash: ((m: string) => void) | null = null;
  compute(job: ViewFactorJob): Promise<ViewFactorAnswer> {
    return new Promise((resolve, reject) => this.calls.push({ job, resolve, reject }));
  }
  terminate() {
    this.terminated = true;
  }
  onCrash(listener: (m: string) => void) {
    this.crash = listener;
  }
  die(message: string) {
    this.crash?.(message);
  }
}

/** A result shaped like the core's, tagged with the job's first coordinate so tests can tell jobs apart. */
export function fakeResult(job: ViewFactorJob): EdgeViewFactors {
  const n = job.polygons.reduce((sum, p) => sum + p.points.length / 2, 0);
  return {
    edgeCount: n,
    edgeLength: new Float64Array(n).fill(job.polygons[0]?.points[0] ?? 0),
    // One part holding every row, each pair's exchange length zero.
    rows: { sets: [Int32Array.from({ length: n }, (_, i) => i)], packed: [new Float64Array((n * (n + 1)) / 2)] },
    closed: true,
  };
}

export function spawner() {
  const workers: FakeWorker[] = [];
  return {
    workers,
    spawn: () => {
      const w = new FakeWorker();
      workers.push(w);
      return w;
    },
  };
}
