// The exchange results as one JSON-ready object: what `exchange --json` prints,
// built in one place so the command line, the design studies and the library
// give the same object for the same file.
import type { ExchangeResult } from '../core/exchange';
import { seesSurroundings } from './exchange/labels';

/** What the object is built from: surface names in matrix order, their lengths and the solved exchange. */
export interface ExchangeJsonInput {
  names: ReadonlyArray<string>;
  /** Surface lengths in the sketch file's units. */
  factors: { surfaceLength: ArrayLike<number> };
  result: ExchangeResult;
}

/**
 * The --json object. Per surface: length (file units), emissivity, temperature
 * (K), netHeat (W per metre of depth), netFlux and radiosity (W/m^2), and with
 * a depth netHeatTotal (W). exchange[i][j]: net heat from surface i to j, W per
 * metre of depth. Open sketches add `surroundings`.
 */
export function exchangeJson({ names, factors, result: r }: ExchangeJsonInput) {
  const n = r.surfaceCount;
  const withDepth = r.depth !== undefined;
  const json: Record<string, unknown> = {
    surfaces: names.map((name, i) => ({
      name,
      length: factors.surfaceLength[i],
      emissivity: r.emissivity[i],
      temperature: r.temperature[i],
      netHeat: r.netHeat[i],
      netFlux: r.netFlux[i],
      radiosity: r.radiosity[i],
      ...(withDepth ? { netHeatTotal: r.netHeatTotal![i] } : {}),
    })),
    exchange: Array.from({ length: n }, (_, i) => Array.from(r.exchange.subarray(i * n, (i + 1) * n))),
    energyBalance: r.energyBalance,
  };
  if (withDepth) json.depth = r.depth;
  if (seesSurroundings(r)) {
    json.surroundings = {
      temperature: r.surroundingsTemperature,
      viewFactors: Array.from(r.surroundingsViewFactor),
      exchange: Array.from(r.surroundingsExchange),
      netHeat: r.surroundingsNetHeat,
      ...(withDepth ? { netHeatTotal: r.surroundingsNetHeatTotal } : {}),
    };
  }
  return json;
}
