// Which blocking discs lie between the two members of a line sweep (lineSweep.ts),
// along the lines that cross both. Past a straight member every disc does (each lies
// wholly in front of its line); past a round member, the discs whose centres come after
// the member's centre along the line, from member 0 towards member 1: disjoint discs
// that one line crosses are met in the order of their centres. That order flips where
// the line runs square to the two centres, where the discs' projections are apart, so
// no free gap is touched. Coordinates about the sweep's origin, sketch units; angles
// in radians.

export class BetweenDiscs {
  /** Discs held; centres (cx, cy). */
  count = 0;
  cx = new Float64Array(32);
  cy = new Float64Array(32);
  /** Per disc and member (2q + m): 1 when the disc lies on the right side of member m. */
  private bits = new Uint8Array(64);
  /** Angles at which a bit flips, ascending, and which bit (2q + m). */
  flipAt = new Float64Array(64);
  flipOf = new Int32Array(64);
  flips = 0;
  /** Each disc's new index after dropNever (-1: dropped). */
  private remap = new Int32Array(32);

  /** Room for n discs (contents are not kept). */
  grow(n: number): void {
    if (this.cx.length >= n) return;
    this.cx = new Float64Array(2 * n);
    this.cy = new Float64Array(2 * n);
    this.bits = new Uint8Array(4 * n);
    this.flipAt = new Float64Array(8 * n);
    this.flipOf = new Int32Array(8 * n);
    this.remap = new Int32Array(2 * n);
  }

  /** 1 when disc q lies between the members now, else 0. */
  active(q: number): number {
    return this.bits[2 * q] & this.bits[2 * q + 1];
  }

  /**
   * The bits just after `from`, and the flips in (from, to], sorted. `sense` is the sign
   * of (-sin θ, cos θ) from member 0 to member 1; member m is round when round[m] is 1,
   * with its centre at (mx[m], my[m]).
   */
  find(from: number, to: number, sense: number, round: Int8Array, mx: Float64Array, my: Float64Array): void {
    const at = from + 1e-9;
    const dx = -Math.sin(at) * sense,
      dy = Math.cos(at) * sense;
    let flips = 0;
    for (let q = 0; q < this.count; q++) {
      for (let m = 0; m < 2; m++) {
        if (round[m] === 0) {
          this.bits[2 * q + m] = 1;
          continue;
        }
        const wx = this.cx[q] - mx[m],
          wy = this.cy[q] - my[m];
        const along = wx * dx + wy * dy;
        this.bits[2 * q + m] = (m === 0 ? along > 0 : along < 0) ? 1 : 0;
        // w . (-sin t, cos t) = 0 at t = atan2(wy, wx) + j pi.
        let t = Math.atan2(wy, wx);
        t += Math.PI * Math.ceil((at - t) / Math.PI);
        for (; t <= to; t += Math.PI) {
          if (t <= at) continue;
          let k = flips++;
          while (k > 0 && this.flipAt[k - 1] > t) {
            this.flipAt[k] = this.flipAt[k - 1];
            this.flipOf[k] = this.flipOf[k - 1];
            k--;
          }
          this.flipAt[k] = t;
          this.flipOf[k] = 2 * q + m;
        }
      }
    }
    this.flips = flips;
  }

  /** Flip bit b (2q + m); returns q when the disc's being between changed, else -1. */
  flip(b: number): number {
    const q = b >> 1,
      was = this.active(q);
    this.bits[b] ^= 1;
    return this.active(q) === was ? -1 : q;
  }

  /**
   * Drop the discs that lie between the members nowhere from `from` to `to` (no flip,
   * not between at the start): they block no line there. Keeps the others in order,
   * and the flips. Returns the new index of each old disc (-1: dropped), or null when
   * none was dropped.
   */
  dropNever(): Int32Array | null {
    const n = this.count,
      bits = this.bits,
      map = this.remap;
    map.fill(0, 0, n);
    for (let f = 0; f < this.flips; f++) map[this.flipOf[f] >> 1] = 1;
    let kept = 0;
    for (let q = 0; q < n; q++) {
      if (map[q] === 0 && this.active(q) === 0) {
        map[q] = -1;
        continue;
      }
      map[q] = kept;
      this.cx[kept] = this.cx[q];
      this.cy[kept] = this.cy[q];
      bits[2 * kept] = bits[2 * q];
      bits[2 * kept + 1] = bits[2 * q + 1];
      kept++;
    }
    if (kept === n) return null;
    for (let f = 0; f < this.flips; f++) {
      const b = this.flipOf[f];
      this.flipOf[f] = 2 * map[b >> 1] + (b & 1);
    }
    this.count = kept;
    return map;
  }
}
