// The few pieces of the WebAssembly binary format the solver's kernels need
// (linearSolveKernel.ts writes the functions): number encodings, the
// instructions used, and a module of functions that import one memory.
// Written out here so nothing is fetched, generated or bundled.

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

/** Value types. */
export const I32 = 0x7f;
export const F64 = 0x7c;
export const V128 = 0x7b;

const simd = (code: number) => [0xfd, ...uleb(code)];

/** Instructions, as byte arrays (memory offsets in bytes; alignment hints of 8 bytes). */
export const op = {
  get: (i: number) => [0x20, ...uleb(i)],
  set: (i: number) => [0x21, ...uleb(i)],
  tee: (i: number) => [0x22, ...uleb(i)],
  i32: (v: number) => [0x41, ...sleb(v)],
  add: [0x6a],
  sub: [0x6b],
  mul: [0x6c],
  and: [0x71],
  ltU: [0x49],
  geU: [0x4f],
  ltS: [0x48],
  loop: [0x03, 0x40],
  block: [0x02, 0x40],
  end: [0x0b],
  /** Branch to the enclosing loop's start (or out of the enclosing block) when the top is non-zero. */
  brIf: (depth: number) => [0x0d, ...uleb(depth)],
  fLoad: (offset: number) => [0x2b, 3, ...uleb(offset)],
  fStore: (offset: number) => [0x39, 3, ...uleb(offset)],
  fAdd: [0xa0],
  fSub: [0xa1],
  fMul: [0xa2],
  fDiv: [0xa3],
  fAbs: [0x99],
  vLoad: (offset: number) => [...simd(0x00), 3, ...uleb(offset)],
  /** Loads one double and copies it into both lanes. */
  vLoadSplat: (offset: number) => [...simd(0x0a), 3, ...uleb(offset)],
  vStore: (offset: number) => [...simd(0x0b), 3, ...uleb(offset)],
  vZero: [...simd(0x0c), ...new Array<number>(16).fill(0)],
  /** Picks 16 bytes from the two vectors on the stack (0-15 the first, 16-31 the second). */
  shuffle: (bytes: number[]) => [...simd(0x0d), ...bytes],
  vSplat: simd(0x14),
  vLane: (lane: number) => [...simd(0x21), lane],
  vAbs: simd(0xec),
  vAdd: simd(0xf0),
  vSub: simd(0xf1),
  vMul: simd(0xf2),
};

export interface WasmFunction {
  name: string;
  params: number[];
  results: number[];
  /** Types of the locals after the parameters, in order. */
  locals: number[];
  body: number[];
}

/** Bytes of a module that imports env.memory and exports `functions` under their names. */
export function assembleModule(functions: WasmFunction[]): Uint8Array<ArrayBuffer> {
  const types = functions.map((f) => [0x60, ...vec(f.params.map((t) => [t])), ...vec(f.results.map((t) => [t]))]);
  const codes = functions.map((f) => {
    const runs: number[][] = [];
    for (const t of f.locals) {
      const last = runs[runs.length - 1];
      if (last && last[1] === t) last[0]++;
      else runs.push([1, t]);
    }
    const body = [...vec(runs.map(([count, t]) => [...uleb(count), t])), ...f.body, 0x0b];
    return [...uleb(body.length), ...body];
  });
  return new Uint8Array([
    ...[0x00, 0x61, 0x73, 0x6d, 1, 0, 0, 0],
    ...section(1, vec(types)),
    ...section(2, vec([[...name('env'), ...name('memory'), 0x02, 0x00, 0x01]])),
    ...section(3, vec(functions.map((_, i) => uleb(i)))),
    ...section(7, vec(functions.map((f, i) => [...name(f.name), 0x00, ...uleb(i)]))),
    ...section(10, vec(codes)),
  ]);
}

/** Appends instructions to a function body; each argument is one instruction or a run of them. */
export function emitter(body: number[]): (...xs: number[][]) => void {
  return (...xs) => {
    for (const x of xs) for (const b of x) body.push(b);
  };
}
