// The worker side of the co-run check (coRun.ts): the same edge matrix as the main
// thread, in a loop of its own, nothing shared but the start signal and the times.
import { workerData } from 'node:worker_threads';
import { coRunLoop, type CoRunJob } from './coRun';

coRunLoop(workerData as CoRunJob);
