import type { Curve } from './curve';

// Lengths: Math.sqrt of the sum of squares, not Math.hypot (see tangents.ts).

/** Margin of the cone tests, radians: directions this close to the cone's edge stay in doubt (kept). */
const SLACK = 1e-9;

/**
 * The target's cone of directions seen from one point p: visible runs lie inside it,
 * so objects and alignments outside it cannot bound one. Set once per point (`from`),
 * then asked about many directions: a piece of the emitter asks for every circle and
 * tangent it finds, and the target's own angles are the same for all of them.
 * Angles in radians; sketch units.
 */
export class TargetCone {
  /** 0: the target surrounds p or p is inside its circle (every direction may meet it); 1: a segment; 2: a solid arc. */
  private kind = 0;
  // Segment: its start from p and the signed angle from start to end. Arc: the centre from p and its half-angle.
  private ax = NaN;
  private ay = NaN;
  private span = NaN;
  private half = NaN;

  /** Take the target `tg` as seen from (px, py). */
  from(tg: Curve, px: number, py: number): void {
    if (tg.isArc) {
      this.kind = 0;
      if (!tg.solid) return; // a shell surrounds p
      const fx = tg.cx - px,
        fy = tg.cy - py;
      const d = Math.sqrt(fx * fx + fy * fy);
      if (!(d > tg.r)) return;
      this.kind = 2;
      this.ax = fx;
      this.ay = fy;
      this.half = Math.asin(tg.r / d);
      return;
    }
    this.kind = 1;
    const ax = tg.ax - px,
      ay = tg.ay - py,
      bx = tg.bx - px,
      by = tg.by - py;
    this.ax = ax;
    this.ay = ay;
    this.span = Math.atan2(ax * by - ay * bx, ax * bx + ay * by);
  }

  /** May the direction (ux, uy) (any length) from p meet the target? */
  toward(ux: number, uy: number): boolean {
    if (this.kind === 0) return true;
    const ax = this.ax,
      ay = this.ay;
    if (this.kind === 2) return Math.abs(Math.atan2(ax * uy - ay * ux, ax * ux + ay * uy)) <= this.half + SLACK;
    const span = this.span;
    const toDir = Math.atan2(ax * uy - ay * ux, ax * ux + ay * uy);
    return span >= 0 ? toDir >= -SLACK && toDir <= span + SLACK : toDir <= SLACK && toDir >= span - SLACK;
  }

  /** May the cone of directions within `half` (radians) of (ux, uy) from p meet the target's cone? */
  meets(ux: number, uy: number, half: number): boolean {
    if (this.kind === 0) return true;
    const ax = this.ax,
      ay = this.ay;
    if (this.kind === 2) return Math.abs(Math.atan2(ax * uy - ay * ux, ax * ux + ay * uy)) <= this.half + half + SLACK;
    const span = this.span;
    const toDir = Math.atan2(ax * uy - ay * ux, ax * ux + ay * uy);
    const lo = Math.min(0, span) - half - SLACK,
      hi = Math.max(0, span) + half + SLACK;
    // The widened cone may pass +-pi: try the direction a turn either way too.
    const turn = 2 * Math.PI;
    return (
      (toDir >= lo && toDir <= hi) ||
      (toDir + turn >= lo && toDir + turn <= hi) ||
      (toDir - turn >= lo && toDir - turn <= hi)
    );
  }
}
