// The exchange results as one JSON-ready object: what `exchange --json` prints,
// built in one place so the command line, the design studies and the library
// give the same object for the same file.
import type { BalanceResult } from '../core/balance';
import { hasGas, seesSurroundings } from './exchange/labels';

/** What the object is built from: surface names in matrix order, their lengths and the solved exchange. */
export interface ExchangeJsonInput {
  names: ReadonlyArray<string>;
  /** Surface lengths in the sketch file's units. */
  factors: { surfaceLength: ArrayLike<number> };
  /** The whole surface balance (radiation, convection, the back). */
  result: BalanceResult;
}

/**
 * The --json object. Per surface: length (file units), emissivity, temperature
 * (K), netHeat, convectionHeat and suppliedHeat (W per metre of depth), netFlux
 * and radiosity (W/m^2), with a depth netHeatTotal (W); a wall adds
 * layerTemperatures and coldFaceTemperature (K), a tube innerTemperature (K).
 * exchange[i][j]: net heat from surface i to j, W per metre of depth. Open
 * sketches add `surroundings`, a gas temperature adds `gas`
 * ({temperature K, convectionHeat W/m given by the gas to all surfaces}).
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
      convectionHeat: r.convectionHeat[i],
      suppliedHeat: r.suppliedHeat[i],
      ...wallAndTube(r, i),
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
  if (hasGas(r)) json.gas = { temperature: r.gasTemperature, convectionHeat: r.gasConvectionHeat };
  return json;
}

/** A wall's layer and cold-face temperatures, a tube's inner wall temperature (K); nothing for other surfaces. */
function wallAndTube(r: BalanceResult, i: number) {
  const layers = r.layerTemperatures[i];
  if (layers) return { layerTemperatures: Array.from(layers), coldFaceTemperature: r.coldFaceTemperature[i] };
  return Number.isNaN(r.innerTemperature[i]) ? {} : { innerTemperature: r.innerTemperature[i] };
}
