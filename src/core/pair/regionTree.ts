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
  /** Item ids in leaf order, and their boxes in that order (4 numbers each). */
  private readonly order: Int32Array;
  private readonly leafBox: Float64Array;
  private stack = new Int32Array(64);
  private readonly sides = new Float64Array(4 * SIDE_STRIDE);

  /** `itemBox`: 4 numbers per item (minX, minY, maxX, maxY), sketch units. */
  constructor(itemBox: Float64Array) {
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
    this.leafBox = new Float64Array(4 * n);
    for (let m = 0; m < n; m++) this.leafBox.set(boxes.subarray(4 * this.order[m], 4 * this.order[m] + 4), 4 * m);
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
    const S = this.sides;
    const sideCount = loadSides(region, S);
    const minX = region.minX,
      minY = region.minY,
      maxX = region.maxX,
      maxY = region.maxY;
    const box = this.box,
      leafBox = this.leafBox,
      first = this.first,
      end = this.end,
      order = this.order,
      leafCount = this.leafCount;
    let stack = this.stack;
    let top = 0;
    stack[top++] = nodes - 1;
    while (top > 0) {
      const k = stack[--top];
      if (!boxMayMeet(box, 4 * k, minX, minY, maxX, maxY, S, sideCount)) continue;
      if (k < leafCount) {
        for (let m = first[k]; m < end[k]; m++) {
          if (boxMayMeet(leafBox, 4 * m, minX, minY, maxX, maxY, S, sideCount) && visit(order[m])) return;
        }
        continue;
      }
      if (top + FAN > stack.length) {
        const grown = new Int32Array(2 * stack.length);
        grown.set(stack);
        this.stack = stack = grown;
      }
      // Push in reverse so children are taken in their stored order.
      for (let c = end[k] - 1; c >= first[k]; c--) stack[top++] = c;
    }
  }
}

/**
 * Per side of the region that has length, SIDE_STRIDE numbers: x0, y0, dx, dy, the
 * margin, and the offsets (0 or 2, 1 or 3) in a box of the corner farthest inside.
 */
const SIDE_STRIDE = 7;

/** The region's sides of nonzero length, in SIDE_ORDER, as loaded for box tests (into `out`); returns their count. */
function loadSides(R: ViewRegion, out: Float64Array): number {
  let count = 0;
  for (let step = 0; step < 4; step++) {
    const k = SIDE_ORDER[step];
    if (!R.on[k]) continue;
    const at = SIDE_STRIDE * count++;
    const dx = R.ex[k] - R.sx[k],
      dy = R.ey[k] - R.sy[k];
    out[at] = R.sx[k];
    out[at + 1] = R.sy[k];
    out[at + 2] = dx;
    out[at + 3] = dy;
    // R.tol is 1e-14 x side length x sketch extent; d below rounds to about 1e-15 of
    // that product, so 100 x R.tol skips a box only when it is surely outside.
    out[at + 4] = 100 * R.tol[k];
    // The box corner farthest inside the side (inward normal (-dy, dx)).
    out[at + 5] = dy > 0 ? 0 : 2;
    out[at + 6] = dx > 0 ? 3 : 1;
  }
  return count;
}

/** False when box B[at..at+4) lies surely outside the region's bounding box or one of its `sideCount` sides. */
function boxMayMeet(
  B: Float64Array,
  at: number,
  minX: number,
  minY: number,
  maxX: number,
  maxY: number,
  S: Float64Array,
  sideCount: number,
): boolean {
  if (B[at] > maxX || B[at + 1] > maxY || B[at + 2] < minX || B[at + 3] < minY) return false;
  for (let s = 0; s < sideCount * SIDE_STRIDE; s += SIDE_STRIDE) {
    const x = B[at + S[s + 5]],
      y = B[at + S[s + 6]];
    if (S[s + 2] * (y - S[s + 1]) - S[s + 3] * (x - S[s]) < -S[s + 4]) return false;
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
