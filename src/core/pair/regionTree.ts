// A static tree of bounding boxes (sketch units) searched with a convex region itself,
// not its bounding box: a node is skipped when its box lies wholly outside one side of
// the region. For a long, slanted region its box covers far more than the region, and
// the obstacles it admits grow with the sketch's detail; those the region admits do
// not. flatbush searches by box only (and allocates per search), hence this small tree.
// Built once per sketch; a search allocates nothing and visits items in an order that
// depends only on the tree and the region.

/** Items per node. */
const FAN = 8;

export class RegionTree {
  /** Node boxes, 4 per node (centre x, centre y, half width, half height); leaves first, the root last. */
  private readonly box: Float64Array;
  /** Children of node k: [first, end) of item ids (a leaf) or node ids (an inner node). */
  private readonly first: Int32Array;
  private readonly end: Int32Array;
  private readonly leafCount: number;
  /** Item ids in leaf order, and their boxes in that order (4 numbers each, as node boxes). */
  private readonly order: Int32Array;
  private readonly leafBox: Float64Array;
  private stack = new Int32Array(64);

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
    this.box = centred(Float64Array.from(box));
    centred(this.leafBox);
    this.first = Int32Array.from(first);
    this.end = Int32Array.from(end);
  }

  /**
   * Call visit(id) for every item whose box may meet the convex region given as sides
   * (box centre and half sizes, then per side its inward normal a, b and offset c,
   * margins folded in; see `boxMayMeet`): a superset, as boxes are skipped only when
   * surely outside. Stops early when visit returns true.
   */
  searchSides(S: Float64Array, sideCount: number, visit: (id: number) => boolean): void {
    const nodes = this.first.length;
    if (nodes === 0) return;
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
      if (!boxMayMeet(box, 4 * k, S, sideCount)) continue;
      if (k < leafCount) {
        for (let m = first[k]; m < end[k]; m++) {
          if (boxMayMeet(leafBox, 4 * m, S, sideCount) && visit(order[m])) return;
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

/** Numbers per side in a region's sides: inward normal a, b and offset c. */
export const SIDE_STRIDE = 3;

/**
 * False when box B[at..at+4) (centre, half sizes) lies surely outside the region's box
 * or one of its sides: a box lies outside side (a, b, c) when
 * a x + b y + |a| w + |b| h + c < 0 at its centre (x, y), half sizes (w, h).
 */
function boxMayMeet(B: Float64Array, at: number, S: Float64Array, sideCount: number): boolean {
  const x = B[at],
    y = B[at + 1],
    w = B[at + 2],
    h = B[at + 3];
  if (Math.abs(x - S[0]) > w + S[2] || Math.abs(y - S[1]) > h + S[3]) return false;
  for (let s = 4; s < 4 + sideCount * SIDE_STRIDE; s += SIDE_STRIDE) {
    const a = S[s],
      b = S[s + 1];
    if (a * x + b * y + Math.abs(a) * w + Math.abs(b) * h + S[s + 2] < 0) return false;
  }
  return true;
}

/** Rewrite boxes (minX, minY, maxX, maxY) in place as (centre x, centre y, half width, half height); returns B. */
function centred(B: Float64Array): Float64Array {
  for (let at = 0; at < B.length; at += 4) {
    const x0 = B[at],
      y0 = B[at + 1],
      x1 = B[at + 2],
      y1 = B[at + 3];
    B[at] = 0.5 * (x0 + x1);
    B[at + 1] = 0.5 * (y0 + y1);
    B[at + 2] = 0.5 * (x1 - x0);
    B[at + 3] = 0.5 * (y1 - y0);
  }
  return B;
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
