// A view-factor worker thread of the command line (started through threadBoot.mjs
// and kept for later jobs): for each job posted on its port it works chunks of the
// shared rows and posts surface sums back. A failure is posted as a message and
// flagged in the shared control array, so the main thread, which waits without an
// event loop, learns of it.
import { workerData, type MessagePort } from 'node:worker_threads';
import { doneSlot, FACTORS, FAILED, ROWS, workChunks, type ThreadJob } from './threadWork';

const { port } = workerData as { port: MessagePort };

function run(job: ThreadJob): void {
  try {
    workChunks(
      job,
      (sums) => {
        const buffers = [sums.rows, sums.self, sums.start, sums.surface, sums.exchange].map((a) => a.buffer);
        port.postMessage({ id: job.id, sums }, buffers as ArrayBuffer[]);
      },
      () => {},
    );
  } catch (error) {
    port.postMessage({ id: job.id, error: error instanceof Error ? error.message : String(error) });
    const control = new Int32Array(job.control);
    Atomics.store(control, FAILED, 1);
    for (let stage = ROWS; stage <= FACTORS; stage++) Atomics.notify(control, doneSlot(stage));
  }
}

port.on('message', (message: { job: ThreadJob }) => run(message.job));
