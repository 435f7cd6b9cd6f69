// The hot loops of the dense LU, as a tiny WebAssembly module with 128-bit
// SIMD (two doubles per instruction). Plain JavaScript tops out near 1e9
// multiply-adds per second, so an n = 2000 factorization (n^3/3 = 2.7e9 of
// them) would take about 3 s.
//
// The block product C -= A * B is done the way optimized BLAS libraries do it:
// a block of A and a block of B are first copied ("packed") into buffers where
// the product reads them in order, then a micro-kernel keeps a 4 x 4 tile of C
// in eight SIMD registers while it runs down the inner dimension, so C is read
// and written once per block instead of once per inner term.
// When WebAssembly SIMD is unavailable, createSolverKernel returns null and
// the solver uses its JavaScript loops instead (same results to rounding).
// All addresses are byte offsets into the kernel's memory.

import { F64, I32, V128, assembleModule, emitter, op, type WasmFunction } from './wasmBytes';

export interface SolverKernel {
  /** The kernel's memory: the solver keeps its matrix at byte 0. */
  memory: WebAssembly.Memory;
  /**
   * Copies `tiles` x 4 rows x k columns of a row-major matrix (row stride in
   * bytes) to dst as, per tile, k groups of 4 (one column of the tile each).
   */
  packA(src: number, dst: number, tiles: number, k: number, stride: number): void;
  /** Copies k rows x `tiles` x 4 columns to dst as, per tile, k rows of 4. */
  packB(src: number, dst: number, tiles: number, k: number, stride: number): void;
  /**
   * C -= A * B on packed blocks: C (row-major at c, row stride in bytes) is
   * (4 rowTiles) x (4 colTiles), A packed by packA, B by packB; every count at least 1.
   */
  product(c: number, a: number, b: number, rowTiles: number, k: number, colTiles: number, stride: number): void;
  /** Sum of x_i y_i over `length` doubles. */
  dot(x: number, y: number, length: number): number;
  /** y_i -= s x_i over `length` doubles. */
  axpy(y: number, x: number, length: number, s: number): void;
  /** y_i += |x_i| over `length` doubles. */
  addAbs(y: number, x: number, length: number): void;
  /** Exchanges `length` doubles at p and q. */
  swap(p: number, q: number, length: number): void;
}

const { get, set, tee, i32, add, mul, ltU, geU, loop, block, end, brIf } = op;

function packAFunction(): WasmFunction {
  // Parameters: 0 src, 1 dst, 2 tiles, 3 k, 4 stride. Two columns per pass:
  // one SIMD load per row, then lanes regrouped by column.
  const [r0, pairLast, t, last, X] = [5, 9, 10, 11, 12]; // r0..r3 at 5..8, X0..X3 at 12..15
  const lanes = (first: number, second: number) => [
    ...Array.from({ length: 8 }, (_, b) => first + b),
    ...Array.from({ length: 8 }, (_, b) => second + b),
  ];
  const low = op.shuffle(lanes(0, 16)); // column k of two rows
  const high = op.shuffle(lanes(8, 24)); // column k + 1
  const body: number[] = [];
  const e = emitter(body);
  e(i32(0), set(t));
  e(loop);
  e(get(0), set(r0));
  for (let r = 1; r < 4; r++) e(get(r0 + r - 1), get(4), add, set(r0 + r));
  e(get(r0), get(3), i32(-2), op.and, i32(8), mul, add, set(pairLast));
  e(get(r0), get(3), i32(8), mul, add, set(last));
  e(block, get(r0), get(pairLast), geU, brIf(0), loop);
  for (let r = 0; r < 4; r++) e(get(r0 + r), op.vLoad(0), set(X + r));
  [low, high].forEach((pick, c) => {
    e(get(1), get(X), get(X + 1), pick, op.vStore(32 * c));
    e(get(1), get(X + 2), get(X + 3), pick, op.vStore(32 * c + 16));
  });
  for (let r = 0; r < 4; r++) e(get(r0 + r), i32(16), add, set(r0 + r));
  e(get(1), i32(64), add, set(1));
  e(get(r0), get(pairLast), ltU, brIf(0));
  e(end, end);
  e(block, get(r0), get(last), geU, brIf(0)); // an odd last column
  for (let r = 0; r < 4; r++) e(get(1), get(r0 + r), op.fLoad(0), op.fStore(8 * r));
  e(get(1), i32(32), add, set(1), end);
  e(get(0), get(4), i32(4), mul, add, set(0));
  e(get(t), i32(1), add, tee(t), get(2), ltU, brIf(0));
  e(end);
  const locals = [...Array<number>(7).fill(I32), ...Array<number>(4).fill(V128)];
  return { name: 'packA', params: [I32, I32, I32, I32, I32], results: [], locals, body };
}

function packBFunction(): WasmFunction {
  // Parameters: 0 src, 1 dst, 2 tiles, 3 k, 4 stride.
  const [p, last, t] = [5, 6, 7];
  const body: number[] = [];
  const e = emitter(body);
  e(i32(0), set(t));
  e(loop);
  e(get(0), set(p), get(0), get(3), get(4), mul, add, set(last));
  e(loop);
  e(get(1), get(p), op.vLoad(0), op.vStore(0), get(1), get(p), op.vLoad(16), op.vStore(16));
  e(get(1), i32(32), add, set(1), get(p), get(4), add, tee(p), get(last), ltU, brIf(0));
  e(end);
  e(get(0), i32(32), add, set(0));
  e(get(t), i32(1), add, tee(t), get(2), ltU, brIf(0));
  e(end);
  return { name: 'packB', params: [I32, I32, I32, I32, I32], results: [], locals: [I32, I32, I32], body };
}

function productFunction(): WasmFunction {
  // Parameters: 0 c, 1 a, 2 b, 3 rowTiles, 4 k, 5 colTiles, 6 stride.
  const [panel, bPanel, bEnd, cCol, aPanel, aEnd, cTile, ap, bp, bStop, row] = [
    7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17,
  ];
  const ACC = 18; // acc[2r + h]: row r, columns 2h and 2h + 1 of the tile
  const [B0, B1, AV] = [26, 27, 28];
  const body: number[] = [];
  const e = emitter(body);
  e(get(4), i32(32), mul, set(panel)); // bytes of one packed tile: k x 4 doubles
  e(get(2), set(bPanel), get(2), get(5), get(panel), mul, add, set(bEnd));
  e(get(0), set(cCol), get(1), get(3), get(panel), mul, add, set(aEnd));
  e(loop); // column tiles
  e(get(1), set(aPanel), get(cCol), set(cTile));
  e(loop); // row tiles
  for (let q = 0; q < 8; q++) e(op.vZero, set(ACC + q));
  e(get(aPanel), set(ap), get(bPanel), tee(bp), get(panel), add, set(bStop));
  // One inner term per pass: the engine unrolls by itself, and unrolling here
  // makes it load every operand of both terms first and spill the tile.
  e(loop);
  e(get(bp), op.vLoad(0), set(B0), get(bp), op.vLoad(16), set(B1));
  for (let r = 0; r < 4; r++) {
    e(get(ap), op.vLoadSplat(8 * r), set(AV));
    e(get(ACC + 2 * r), get(AV), get(B0), op.vMul, op.vAdd, set(ACC + 2 * r));
    e(get(ACC + 2 * r + 1), get(AV), get(B1), op.vMul, op.vAdd, set(ACC + 2 * r + 1));
  }
  e(get(ap), i32(32), add, set(ap), get(bp), i32(32), add, tee(bp), get(bStop), ltU, brIf(0));
  e(end);
  e(get(cTile), set(row));
  for (let r = 0; r < 4; r++) {
    for (let h = 0; h < 2; h++) {
      e(get(row), get(row), op.vLoad(16 * h), get(ACC + 2 * r + h), op.vSub, op.vStore(16 * h));
    }
    e(get(row), get(6), add, set(row));
  }
  e(get(row), set(cTile));
  e(get(aPanel), get(panel), add, tee(aPanel), get(aEnd), ltU, brIf(0));
  e(end);
  e(get(cCol), i32(32), add, set(cCol));
  e(get(bPanel), get(panel), add, tee(bPanel), get(bEnd), ltU, brIf(0));
  e(end);
  const locals = [...Array<number>(11).fill(I32), ...Array<number>(11).fill(V128)];
  return { name: 'product', params: [I32, I32, I32, I32, I32, I32, I32], results: [], locals, body };
}

function dotFunction(): WasmFunction {
  // Parameters: 0 x, 1 y, 2 length; result f64.
  const [quadEnd, allEnd, S0, S1, R] = [3, 4, 5, 6, 7];
  const body: number[] = [];
  const e = emitter(body);
  e(get(0), get(2), i32(-4), op.and, i32(8), mul, add, set(quadEnd));
  e(get(0), get(2), i32(8), mul, add, set(allEnd));
  e(op.vZero, set(S0), op.vZero, set(S1));
  e(block, get(0), get(quadEnd), geU, brIf(0), loop);
  for (let h = 0; h < 2; h++) {
    const s = h === 0 ? S0 : S1;
    e(get(s), get(0), op.vLoad(16 * h), get(1), op.vLoad(16 * h), op.vMul, op.vAdd, set(s));
  }
  e(get(1), i32(32), add, set(1), get(0), i32(32), add, tee(0), get(quadEnd), ltU, brIf(0));
  e(end, end);
  e(get(S0), get(S1), op.vAdd, tee(S0), op.vLane(0), get(S0), op.vLane(1), op.fAdd, set(R));
  e(block, get(0), get(allEnd), geU, brIf(0), loop);
  e(get(R), get(0), op.fLoad(0), get(1), op.fLoad(0), op.fMul, op.fAdd, set(R));
  e(get(1), i32(8), add, set(1), get(0), i32(8), add, tee(0), get(allEnd), ltU, brIf(0));
  e(end, end);
  e(get(R));
  return { name: 'dot', params: [I32, I32, I32], results: [F64], locals: [I32, I32, V128, V128, F64], body };
}

function axpyFunction(): WasmFunction {
  // Parameters: 0 y, 1 x, 2 length, 3 s.
  const [quadEnd, allEnd, SV] = [4, 5, 6];
  const body: number[] = [];
  const e = emitter(body);
  e(get(0), get(2), i32(-4), op.and, i32(8), mul, add, set(quadEnd));
  e(get(0), get(2), i32(8), mul, add, set(allEnd));
  e(get(3), op.vSplat, set(SV));
  e(block, get(0), get(quadEnd), geU, brIf(0), loop);
  for (let h = 0; h < 2; h++) {
    e(get(0), get(0), op.vLoad(16 * h), get(SV), get(1), op.vLoad(16 * h), op.vMul, op.vSub, op.vStore(16 * h));
  }
  e(get(1), i32(32), add, set(1), get(0), i32(32), add, tee(0), get(quadEnd), ltU, brIf(0));
  e(end, end);
  e(block, get(0), get(allEnd), geU, brIf(0), loop);
  e(get(0), get(0), op.fLoad(0), get(3), get(1), op.fLoad(0), op.fMul, op.fSub, op.fStore(0));
  e(get(1), i32(8), add, set(1), get(0), i32(8), add, tee(0), get(allEnd), ltU, brIf(0));
  e(end, end);
  return { name: 'axpy', params: [I32, I32, I32, F64], results: [], locals: [I32, I32, V128], body };
}

function addAbsFunction(): WasmFunction {
  // Parameters: 0 y, 1 x, 2 length.
  const [pairEnd, allEnd] = [3, 4];
  const body: number[] = [];
  const e = emitter(body);
  e(get(0), get(2), i32(-2), op.and, i32(8), mul, add, set(pairEnd));
  e(get(0), get(2), i32(8), mul, add, set(allEnd));
  e(block, get(0), get(pairEnd), geU, brIf(0), loop);
  e(get(0), get(0), op.vLoad(0), get(1), op.vLoad(0), op.vAbs, op.vAdd, op.vStore(0));
  e(get(1), i32(16), add, set(1), get(0), i32(16), add, tee(0), get(pairEnd), ltU, brIf(0));
  e(end, end);
  e(block, get(0), get(allEnd), geU, brIf(0));
  e(get(0), get(0), op.fLoad(0), get(1), op.fLoad(0), op.fAbs, op.fAdd, op.fStore(0), end);
  return { name: 'addAbs', params: [I32, I32, I32], results: [], locals: [I32, I32], body };
}

function swapFunction(): WasmFunction {
  // Parameters: 0 p, 1 q, 2 length (pairs of doubles by SIMD, a last odd one alone).
  const [pairEnd, allEnd, T] = [3, 4, 5];
  const body: number[] = [];
  const e = emitter(body);
  e(get(0), get(2), i32(-2), op.and, i32(8), mul, add, set(pairEnd));
  e(get(0), get(2), i32(8), mul, add, set(allEnd));
  e(block, get(0), get(pairEnd), geU, brIf(0), loop);
  e(get(0), op.vLoad(0), set(T), get(0), get(1), op.vLoad(0), op.vStore(0), get(1), get(T), op.vStore(0));
  e(get(1), i32(16), add, set(1), get(0), i32(16), add, tee(0), get(pairEnd), ltU, brIf(0));
  e(end, end);
  e(block, get(0), get(allEnd), geU, brIf(0));
  e(get(0), op.vLoadSplat(0), set(T), get(0), get(1), op.fLoad(0), op.fStore(0), get(1), get(T), op.vLane(0));
  e(op.fStore(0), end);
  return { name: 'swap', params: [I32, I32, I32], results: [], locals: [I32, I32, V128], body };
}

/** Bytes of the module: imports env.memory, exports the functions of SolverKernel. */
export function solverKernelBytes(): Uint8Array<ArrayBuffer> {
  return assembleModule([
    packAFunction(),
    packBFunction(),
    productFunction(),
    dotFunction(),
    axpyFunction(),
    addAbsFunction(),
    swapFunction(),
  ]);
}

let compiled: WebAssembly.Module | null | undefined;

/**
 * The kernel with its own memory of at least `bytes` bytes, or null when this
 * JavaScript engine has no WebAssembly SIMD (or the memory cannot be had).
 * The module is compiled once per process.
 */
export function createSolverKernel(bytes: number): SolverKernel | null {
  try {
    if (compiled === undefined) {
      const code = solverKernelBytes();
      compiled = typeof WebAssembly === 'object' && WebAssembly.validate(code) ? new WebAssembly.Module(code) : null;
    }
    if (compiled === null) return null;
    if (bytes > 2 ** 31) return null; // keep every byte offset a positive i32
    const memory = new WebAssembly.Memory({ initial: Math.max(1, Math.ceil(bytes / 65536)) });
    const exports = new WebAssembly.Instance(compiled, { env: { memory } }).exports;
    return { memory, ...(exports as unknown as Omit<SolverKernel, 'memory'>) };
  } catch {
    return null;
  }
}
