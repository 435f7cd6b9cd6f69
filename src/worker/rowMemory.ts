// What one worker remembers between jobs (comlink calls): its last packed rows, so
// that a drag step computes only the pairs a moved shape can change, and spare
// buffers the page handed back, so that an answer rarely needs a fresh buffer. A
// fresh buffer of a drag-size answer (2 MB) costs a Chromium worker 9-15 ms here,
// each new page of memory a fault, more than the pairs of one drag step.
import type { EdgePairs } from '../core/pairRows';

/** A worker's last packed rows and the sketch they were computed for. */
export interface EarlierRows {
  pairs: EdgePairs;
  rows: Int32Array;
  packed: Float64Array;
}

/**
 * Most packed pairs a worker keeps for the next job (64 MB): a bigger sketch is
 * rarely dragged live, and its copy would double the worker's memory.
 */
export const MAX_KEPT_PAIRS = 1 << 23;

/**
 * Spare buffers kept at most: the page hands back one answer's buffer per answer it
 * files, and the next answer takes it, so one is enough; more would only hold memory
 * (at 5000 edges a worker's share is tens of MB).
 */
const MAX_SPARES = 1;

export class RowMemory {
  /** The rows kept from the last job, or null (none yet, too big, or the last job failed). */
  earlier: EarlierRows | null = null;
  private spares: Float64Array[] = [];

  /** Take the kept rows for a job (forgotten first: a job that throws leaves nothing half-updated behind). */
  take(): EarlierRows | null {
    const e = this.earlier;
    this.earlier = null;
    return e;
  }

  /** Keep these rows for the next job unless they pass MAX_KEPT_PAIRS; true when kept. */
  keep(kept: EarlierRows): boolean {
    if (kept.packed.length > MAX_KEPT_PAIRS) return false;
    this.earlier = kept;
    return true;
  }

  /** A copy of `from` in a spare buffer of its length when there is one, else in a fresh one. */
  copy(from: Float64Array): Float64Array {
    const k = this.spares.findIndex((s) => s.length === from.length);
    if (k < 0) return from.slice();
    const out = this.spares[k];
    this.spares.splice(k, 1);
    out.set(from);
    return out;
  }

  /** Buffers the page no longer holds (the newest kept, the oldest dropped past MAX_SPARES). */
  recycle(buffers: readonly Float64Array[]): void {
    for (const b of buffers) if (b.length > 0 && b.length <= MAX_KEPT_PAIRS) this.spares.push(b);
    if (this.spares.length > MAX_SPARES) this.spares.splice(0, this.spares.length - MAX_SPARES);
  }
}
