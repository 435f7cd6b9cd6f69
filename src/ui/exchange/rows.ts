// One row per surface of a solved exchange (and one for the surroundings of an
// open sketch), in the units the panel shows: K, W per metre of depth, W/m^2, W.
import type { ExchangeSolved } from '../../state/exchange/slice';
import { conditionInTable, seesSurroundings, SURROUNDINGS_LABEL } from '../../state/exchange/labels';

export interface ExchangeRow {
  name: string;
  /** Null for the surroundings row. */
  index: number | null;
  condition: string;
  emissivity: number;
  temperature: number;
  netHeat: number;
  /** Undefined for the surroundings (no area of their own). */
  netFlux: number | undefined;
  total: number | undefined;
}

export function exchangeRows(ex: ExchangeSolved): ExchangeRow[] {
  const r = ex.result;
  const rows: ExchangeRow[] = ex.names.map((name, i) => ({
    name,
    index: i,
    condition: conditionInTable(ex.conditions[i].kind),
    emissivity: r.emissivity[i],
    temperature: r.temperature[i],
    netHeat: r.netHeat[i],
    netFlux: r.netFlux[i],
    total: r.netHeatTotal?.[i],
  }));
  if (seesSurroundings(r) && r.surroundingsTemperature !== undefined) {
    rows.push({
      name: SURROUNDINGS_LABEL.name,
      index: null,
      condition: SURROUNDINGS_LABEL.condition,
      emissivity: 1,
      temperature: r.surroundingsTemperature,
      netHeat: r.surroundingsNetHeat,
      netFlux: undefined,
      total: r.surroundingsNetHeatTotal,
    });
  }
  return rows;
}
