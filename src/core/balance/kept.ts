// What a balance solved with kept memory (exchange/solverMemory.ts) takes from
// the one before: the factored radiosity network, when the factors, lengths,
// emissivities and surroundings are the same numbers, and the radiation part of
// the Newton matrix, when the unknown surfaces are the same too. Neither
// depends on a temperature, a film coefficient or a lining, so an edit of one
// of those (the usual edit, and the usual study) skips the two costliest
// stages: at 1012 surfaces about 55 ms and 110 ms of a 240 ms solve.
// Compared by value, never by identity alone: an array can be refilled.
import type { SolverMemory } from '../exchange/solverMemory';
import type { RadiosityNetwork } from './radiosity';
import { sameEntries } from '../sameEntries';

interface Kept {
  F: Float64Array;
  area: Float64Array;
  eps: Float64Array;
  Fs: Float64Array;
  Es: number;
  network: RadiosityNetwork;
  /** The unknown surfaces, node by node, each node's count first; and the coupling made for them. */
  nodes: Int32Array | null;
  coupling: { Z: Float64Array; W: Float64Array } | null;
}

const kept = new WeakMap<SolverMemory, Kept>();

/** Copy of `from` into `into` when of its length (kept memory), else a new copy. */
function copyOf(from: ArrayLike<number>, into: Float64Array | undefined): Float64Array {
  if (into && into.length === from.length) {
    into.set(from);
    return into;
  }
  return Float64Array.from(from);
}

/**
 * The network for these numbers (F n x n, area m, eps, Fs, Es W/m^2): the kept
 * one when every number is the same, else `make(...)` (which may throw), then
 * kept. `make` gets copies the memory owns, so the network never reads an
 * array its caller may refill or hand away (a worker transfers its answer's).
 */
export function keptNetwork(
  memory: SolverMemory | undefined,
  F: ArrayLike<number>,
  area: ArrayLike<number>,
  eps: Float64Array,
  Fs: Float64Array,
  Es: number,
  make: (F: ArrayLike<number>, area: ArrayLike<number>, eps: Float64Array, Fs: Float64Array) => RadiosityNetwork,
): RadiosityNetwork {
  if (!memory) return make(F, area, eps, Fs);
  const k = kept.get(memory);
  if (
    k &&
    k.Es === Es &&
    sameEntries(k.eps, eps) &&
    sameEntries(k.Fs, Fs) &&
    sameEntries(k.area, area) &&
    sameEntries(k.F, F)
  )
    return k.network;
  kept.delete(memory); // its solver is about to be refilled
  const own = {
    F: copyOf(F, k?.F),
    area: Float64Array.from(area),
    eps: Float64Array.from(eps),
    Fs: Float64Array.from(Fs),
  };
  const network = make(own.F, own.area, own.eps, own.Fs);
  kept.set(memory, { ...own, Es, network, nodes: null, coupling: null });
  return network;
}

/** The Newton coupling of `network` for these nodes: the kept one when both are the same, else `make()`, then kept. */
export function keptCoupling(
  memory: SolverMemory | undefined,
  network: RadiosityNetwork,
  members: ReadonlyArray<ReadonlyArray<number>>,
  make: () => { Z: Float64Array; W: Float64Array },
): { Z: Float64Array; W: Float64Array } {
  const k = memory ? kept.get(memory) : undefined;
  if (!k || k.network !== network) return make();
  const nodes = Int32Array.from(members.flatMap((m) => [m.length, ...m]));
  if (k.coupling && k.nodes && sameEntries(k.nodes, nodes)) return k.coupling;
  k.coupling = make();
  k.nodes = nodes;
  return k.coupling;
}
