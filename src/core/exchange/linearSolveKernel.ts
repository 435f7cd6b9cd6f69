// The one hot loop of the dense LU: C -= A * B on blocks of a row-major matrix.
// Plain JavaScript tops out near 1e9 multiply-adds per second, so an n = 2000
// factorization (n^3/3 = 2.7e9 of them) would take about 3 s. This builds a
// tiny WebAssembly module (128-bit SIMD, two doubles per instruction) from
// bytes written out here, so nothing is fetched, generated or bundled.
// When WebAssembly SIMD is unavailable, createProductKernel returns null and
// the solver uses its JavaScript loop instead (same results, slower).

/**
 * Subtracts a block product in place: C -= A * B, all three blocks inside one
 * row-major matrix in the kernel's memory (byte offsets, common row stride in
 * bytes). C is (2*rowPairs) x (4*colQuads), A is (2*rowPairs) x (4*innerQuads),
 * B is (4*innerQuads) x (4*colQuads). All counts must be at least 1.
 */
export type ProductKernel = (
  cOffset: number,
  aOffset: number,
  bOffset: number,
  rowPairs: number,
  innerQuads: number,
  colQuads: number,
  strideBytes: number,
) => void;

export interface KernelInstance {
  kernel: ProductKernel;
  /** The kernel's memory as doubles: the solver keeps its matrix here. */
  memory: WebAssembly.Memory;
}

const uleb = (v: number): number[] => {
  const out: number[] = [];
  do {
    let b = v & 0x7f;
    v >>>= 7;
    if (v) b |= 0x80;
    out.push(b);
  } while (v);
  return out;
};
const sleb = (v: number): number[] => {
  const out: number[] = [];
  for (;;) {
    const b = v & 0x7f;
    v >>= 7;
    if ((v === 0 && !(b & 0x40)) || (v === -1 && b & 0x40)) {
      out.push(b);
      return out;
    }
    out.push(b | 0x80);
  }
};
const vec = (items: number[][]): number[] => [...uleb(items.length), ...items.flat()];
const section = (id: number, bytes: number[]): number[] => [id, ...uleb(bytes.length), ...bytes];
const name = (s: string): number[] => vec([...s].map((c) => [c.charCodeAt(0)]));

const I32 = 0x7f;
const V128 = 0x7b;
const get = (i: number) => [0x20, ...uleb(i)];
const set = (i: number) => [0x21, ...uleb(i)];
const tee = (i: number) => [0x22, ...uleb(i)];
const i32 = (v: number) => [0x41, ...sleb(v)];
const ADD = [0x6a];
const SUB = [0x6b];
const MUL = [0x6c];
const LT_U = [0x49];
const LOOP = [0x03, 0x40];
const END = [0x0b];
const BR_IF_LOOP = [0x0d, 0];
const simd = (op: number) => [0xfd, ...uleb(op)];
const vLoad = (offset: number) => [...simd(0x00), 3, ...uleb(offset)];
const vStore = (offset: number) => [...simd(0x0b), 3, ...uleb(offset)];
const f64Load = (offset: number) => [0x2b, 3, ...uleb(offset)];
const SPLAT = simd(0x14);
const F_SUB = simd(0xf1);
const F_MUL = simd(0xf2);

/** Bytes of the module: imports env.memory, exports `product` (see ProductKernel). */
export function productKernelBytes(): Uint8Array<ArrayBuffer> {
  // Parameters 0..6: c, a, b, rowPairs, innerQuads, colQuads, stride.
  const [ip, pq, o, wBytes, cr0, cr1, ar0, ar1, br0, br1, br2, br3] = [7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 18];
  const [t0, t4, t5] = [19, 23, 24]; // t0..t3: B row addresses, t4/t5: C row addresses
  const L0 = 25; // splatted A values of row 0: L0..L0+3
  const L1 = 29; // ... of row 1
  const U = 33; // four B vectors
  const body: number[] = [];
  const e = (...xs: number[][]) => {
    for (const x of xs) body.push(...x);
  };
  // Micro-kernel: 2 rows x 4 inner x 4 columns (two f64x2 per row), C kept in
  // L1 while four B rows stream past; the caller blocks for the larger caches.
  e(get(5), i32(32), MUL, set(wBytes));
  e(get(0), set(cr0), get(1), set(ar0), i32(0), set(ip));
  e(LOOP); // row pairs
  e(get(cr0), get(6), ADD, set(cr1), get(ar0), get(6), ADD, set(ar1));
  e(get(2), set(br0), i32(0), set(pq));
  e(LOOP); // inner quads
  for (let q = 0; q < 4; q++) {
    e(get(ar0), f64Load(8 * q), SPLAT, set(L0 + q));
    e(get(ar1), f64Load(8 * q), SPLAT, set(L1 + q));
  }
  e(get(br0), get(6), ADD, set(br1), get(br1), get(6), ADD, set(br2), get(br2), get(6), ADD, set(br3));
  e(i32(0), set(o));
  e(LOOP); // column quads
  [br0, br1, br2, br3].forEach((r, q) => e(get(r), get(o), ADD, set(t0 + q)));
  e(get(cr0), get(o), ADD, set(t4), get(cr1), get(o), ADD, set(t5));
  for (let h = 0; h < 2; h++) {
    for (let q = 0; q < 4; q++) e(get(t0 + q), vLoad(16 * h), set(U + q));
    for (const [tc, L] of [
      [t4, L0],
      [t5, L1],
    ]) {
      e(get(tc), get(tc), vLoad(16 * h));
      for (let q = 0; q < 4; q++) e(get(L + q), get(U + q), F_MUL, F_SUB);
      e(vStore(16 * h));
    }
  }
  e(get(o), i32(32), ADD, tee(o), get(wBytes), LT_U, BR_IF_LOOP);
  e(END);
  e(get(ar0), i32(32), ADD, set(ar0), get(ar1), i32(32), ADD, set(ar1));
  e(get(br3), get(6), ADD, set(br0));
  e(get(pq), i32(1), ADD, tee(pq), get(4), LT_U, BR_IF_LOOP);
  e(END);
  e(get(cr0), get(6), i32(2), MUL, ADD, set(cr0));
  e(get(ar0), get(4), i32(32), MUL, SUB, get(6), i32(2), MUL, ADD, set(ar0));
  e(get(ip), i32(1), ADD, tee(ip), get(3), LT_U, BR_IF_LOOP);
  e(END);
  e(END);
  const locals = vec([
    [...uleb(18), I32],
    [...uleb(12), V128],
  ]);
  const func = [...locals, ...body];
  return new Uint8Array([
    0x00,
    0x61,
    0x73,
    0x6d,
    1,
    0,
    0,
    0,
    ...section(1, vec([[0x60, ...vec(Array.from({ length: 7 }, () => [I32])), 0]])),
    ...section(2, vec([[...name('env'), ...name('memory'), 0x02, 0x00, 0x01]])),
    ...section(3, vec([[0]])),
    ...section(7, vec([[...name('product'), 0x00, 0]])),
    ...section(10, vec([[...uleb(func.length), ...func]])),
  ]);
}

let compiled: WebAssembly.Module | null | undefined;

/**
 * A kernel with its own memory of at least `doubles` float64 values, or null
 * when this JavaScript engine has no WebAssembly SIMD (or the memory cannot be
 * had). The module is compiled once per process.
 */
export function createProductKernel(doubles: number): KernelInstance | null {
  try {
    if (compiled === undefined) {
      const bytes = productKernelBytes();
      compiled = typeof WebAssembly === 'object' && WebAssembly.validate(bytes) ? new WebAssembly.Module(bytes) : null;
    }
    if (compiled === null) return null;
    const bytes = doubles * 8;
    if (bytes > 2 ** 31) return null; // keep every byte offset a positive i32
    const memory = new WebAssembly.Memory({ initial: Math.max(1, Math.ceil(bytes / 65536)) });
    const instance = new WebAssembly.Instance(compiled, { env: { memory } });
    return { kernel: instance.exports.product as unknown as ProductKernel, memory };
  } catch {
    return null;
  }
}
