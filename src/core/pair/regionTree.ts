import { SIDE_ORDER as SIDE_ORDER_IN, type ViewRegion } from './viewRegion';

// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call, measured at ~10% of hard scenes.
const SIDE_ORDER = SIDE_ORDER_IN;

// A static tree of bounding boxes (sketch units) searched with the view region H
// itself, not its bounding box: a node is skipped when its box lies wholly outside
// one side of H. For a long, slanted H the box of H covers far more than H, and the
// obstacles it admits grow with the sketch's detail; those H admits do not. flatbush
// searches by box only (and allocates per search), hence this small tree.
// Built once per sketch; a search allocates nothing and visits items in an order that
// depends only on the tree and the region.

/** Items per node. */
const FAN = 8;

export class RegionTree {
  /** Node boxes, 4 per node (minX, minY, maxX, maxY); leaves first, the root last. */
  private readonly box: Float64Array;
  /** Children of node k: [first, end) of item ids (a leaf) or node ids (an inner node). */
  private readonly first: Int32Array;
  private readonly end: Int32Array;
  private readonly leafCount: number;
  /** Item ids in leaf order. */
  private readonly order: Int32Array;
  private stack = new Int32Array(64);
  private readonly sides = new Float64Array(4 * SIDE_STRIDE);

  /** `itemBox`: 4 numbers per item (minX, minY, maxX, maxY), sketch units; kept, not copied. */
  constructor(private readonly itemBox: Float64Array) {
    const boxes = itemBox;
    const n = boxes.length >> 2;
    // Leaf order: items sorted along a Z-order curve of their centres, so a leaf holds neighbours.
    let x0 = Infinity,
      y0 = Infinity,
      x1 = -Infinity,
      y1 = -Infinity;
    for (let k = 0; k < n; k++) {
      x0 = Math.min(x0, boxes[4 * k]);
      y0 = Math.min(y0, boxes[4 * k + 1]);
      x1 = Math.max(x1, boxes[4 * k + 2]);
      y1 = Math.max(y1, boxes[4 * k + 3]);
    }
    const code = new Float64Array(n);
    const sx = x1 > x0 ? 65535 / (x1 - x0) : 0,
      sy = y1 > y0 ? 65535 / (y1 - y0) : 0;
    for (let k = 0; k < n; k++) {
      const cx = Math.floor((0.5 * (boxes[4 * k] + boxes[4 * k + 2]) - x0) * sx);
      const cy = Math.floor((0.5 * (boxes[4 * k + 1] + boxes[4 * k + 3]) - y0) * sy);
      code[k] = interleave(cx, cy);
    }
    this.order = Int32Array.from({ length: n }, (_, k) => k).sort((a, b) => code[a] - code[b] || a - b);
    // Levels bottom-up: leaves group FAN items, inner nodes group FAN nodes.
    const first: number[] = [],
      end: number[] = [],
      box: number[] = [];
    for (let s = 0; s < n; s += FAN) {
      const e = Math.min(n, s + FAN);
      first.push(s);
      end.push(e);
      const b = [Infinity, Infinity, -Infinity, -Infinity];
      for (let m = s; m < e; m++) grow(b, boxes, this.order[m]);
      box.push(...b);
    }
    this.leafCount = first.length;
    let levelStart = 0,
      levelEnd = first.length;
    while (levelEnd - levelStart > 1) {
      for (let s = levelStart; s < levelEnd; s += FAN) {
        const e = Math.min(levelEnd, s + FAN);
        first.push(s);
        end.push(e);
        const b = [Infinity, Infinity, -Infinity, -Infinity];
        for (let m = s; m < e; m++) grow(b, box, m);
        box.push(...b);
      }
      levelStart = levelEnd;
      levelEnd = first.length;
    }
    this.box = Float64Array.from(box);
    this.first = Int32Array.from(first);
    this.end = Int32Array.from(end);
  }

  /**
   * Call visit(id) for every item whose box may meet the region (a superset: boxes
   * surely outside a side of the region, by a float test with a wide margin, are
   * skipped). Stops early when visit returns true.
   */
  search(region: ViewRegion, visit: (id: number) => boolean): void {
    const nodes = this.first.length;
    if (nodes === 0) return;
    loadSides(region, this.sides);
    let top = 0;
    this.stack[top++] = nodes - 1;
    while (top > 0) {
      const k = this.stack[--top];
      if (!boxMayMeet(region, this.sides, this.box, 4 * k)) continue;
      if (k < this.leafCount) {
        for (let m = this.first[k]; m < this.end[k]; m++) {
          const item = this.order[m];
          if (boxMayMeet(region, this.sides, this.itemBox, 4 * item) && visit(item)) return;
        }
        continue;
      }
      if (top + FAN > this.stack.length) {
        const grown = new Int32Array(2 * this.stack.length);
        grown.set(this.stack);
        this.stack = grown;
      }
      // Push in reverse so children are taken in their stored order.
      for (let c = this.end[k] - 1; c >= this.first[k]; c--) this.stack[top++] = c;
    }
  }
}

/** Per side of the region, 6 numbers: x0, y0, dx, dy, margin, and 1 if the side has length. */
const SIDE_STRIDE = 6;

/** The region's sides in SIDE_ORDER, as loaded for box tests (into `out`, 4 x SIDE_STRIDE). */
function loadSides(R: ViewRegion, out: Float64Array): void {
  for (let step = 0; step < 4; step++) {
    const k = SIDE_ORDER[step],
      at = SIDE_STRIDE * step;
    out[at] = R.sx[k];
    out[at + 1] = R.sy[k];
    out[at + 2] = R.ex[k] - R.sx[k];
    out[at + 3] = R.ey[k] - R.sy[k];
    // R.tol is 1e-14 x side length x sketch extent; d below rounds to about 1e-15 of
    // that product, so 100 x R.tol skips a box only when it is surely outside.
    out[at + 4] = 100 * R.tol[k];
    out[at + 5] = R.on[k];
  }
}

/** False when box B[at..at+4) lies surely outside the region's bounding box or one of its sides. */
function boxMayMeet(R: ViewRegion, S: Float64Array, B: Float64Array, at: number): boolean {
  const bx0 = B[at],
    by0 = B[at + 1],
    bx1 = B[at + 2],
    by1 = B[at + 3];
  if (bx0 > R.maxX || by0 > R.maxY || bx1 < R.minX || by1 < R.minY) return false;
  for (let s = 0; s < 4 * SIDE_STRIDE; s += SIDE_STRIDE) {
    if (S[s + 5] === 0) continue;
    const dx = S[s + 2],
      dy = S[s + 3];
    // The box corner farthest inside the side (inward normal (-dy, dx)).
    const x = dy > 0 ? bx0 : bx1,
      y = dx > 0 ? by1 : by0;
    if (dx * (y - S[s + 1]) - dy * (x - S[s]) < -S[s + 4]) return false;
  }
  return true;
}

/** Grow box b (minX, minY, maxX, maxY) by item m of flat boxes B. */
function grow(b: number[], B: ArrayLike<number>, m: number): void {
  b[0] = Math.min(b[0], B[4 * m]);
  b[1] = Math.min(b[1], B[4 * m + 1]);
  b[2] = Math.max(b[2], B[4 * m + 2]);
  b[3] = Math.max(b[3], B[4 * m + 3]);
}

/** Z-order code of two 16-bit integers. */
function interleave(x: number, y: number): number {
  let code = 0;
  for (let bit = 15; bit >= 0; bit--) code = code * 4 + ((x >> bit) & 1) * 2 + ((y >> bit) & 1);
  return code;
}
