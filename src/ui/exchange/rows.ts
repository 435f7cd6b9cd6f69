// One row per surface of a solved exchange (and one for the surroundings of an
// open sketch, one for the gas), in the units the panel shows: K, W per metre of depth, W/m^2, W.
import type { ExchangeSolved } from '../../state/exchange/slice';
import {
  burnWarning,
  conditionInTable,
  GAS_LABEL,
  hasGas,
  seesSurroundings,
  SURROUNDINGS_LABEL,
} from '../../state/exchange/labels';

export interface ExchangeRow {
  name: string;
  /** Null for the surroundings row. */
  index: number | null;
  condition: string;
  /** Undefined for the gas. */
  emissivity: number | undefined;
  temperature: number;
  /** Net radiation leaving the front, W/m (undefined for the gas). */
  netHeat: number | undefined;
  /** Convection leaving the front, W/m (the gas: what it gives to all surfaces). */
  convection: number;
  /** Heat supplied from behind, W/m. */
  supplied: number;
  /** Undefined for the surroundings and the gas (no area of their own). */
  netFlux: number | undefined;
  total: number | undefined;
  /** A wall's cold face or a tube's inner wall temperature, K, and which it is. */
  inside: { kelvin: number; what: 'cold face' | 'tube inner wall' } | undefined;
  /** The burn warning for a wall's hot casing, or null. */
  burn: string | null;
}

// Per solve: the table, its cautions and its memoised rows share one list. Keyed on
// the result, so the same answer marked stale (a copy of the view) keeps its rows.
const cache = new WeakMap<ExchangeSolved['result'], ExchangeRow[]>();

export function exchangeRows(ex: ExchangeSolved): ExchangeRow[] {
  let rows = cache.get(ex.result);
  if (!rows) cache.set(ex.result, (rows = buildRows(ex)));
  return rows;
}

function buildRows(ex: ExchangeSolved): ExchangeRow[] {
  const r = ex.result;
  const rows: ExchangeRow[] = ex.names.map((name, i) => {
    const kind = ex.conditions[i].kind;
    const inside =
      kind === 'wall'
        ? { kelvin: r.coldFaceTemperature[i], what: 'cold face' as const }
        : kind === 'tube'
          ? { kelvin: r.innerTemperature[i], what: 'tube inner wall' as const }
          : undefined;
    return {
      name,
      index: i,
      condition: conditionInTable(kind),
      emissivity: r.emissivity[i],
      temperature: r.temperature[i],
      netHeat: r.netHeat[i],
      convection: r.convectionHeat[i],
      supplied: r.suppliedHeat[i],
      netFlux: r.netFlux[i],
      total: r.netHeatTotal?.[i],
      inside,
      burn: kind === 'wall' ? burnWarning(name, r.coldFaceTemperature[i]) : null,
    };
  });
  if (seesSurroundings(r) && r.surroundingsTemperature !== undefined) {
    rows.push({
      name: SURROUNDINGS_LABEL.name,
      index: null,
      condition: SURROUNDINGS_LABEL.condition,
      emissivity: 1,
      temperature: r.surroundingsTemperature,
      netHeat: r.surroundingsNetHeat,
      convection: 0,
      supplied: r.surroundingsNetHeat,
      netFlux: undefined,
      total: r.surroundingsNetHeatTotal,
      inside: undefined,
      burn: null,
    });
  }
  if (hasGas(r)) {
    rows.push({
      name: GAS_LABEL.name,
      index: null,
      condition: GAS_LABEL.condition,
      emissivity: undefined,
      temperature: r.gasTemperature!,
      netHeat: undefined,
      convection: r.gasConvectionHeat,
      supplied: r.gasConvectionHeat,
      netFlux: undefined,
      total: undefined,
      inside: undefined,
      burn: null,
    });
  }
  return rows;
}
