// Range checks of the whole surface balance's input, each refusal a code with
// the surface, layer and number concerned (src/document words them).
import { exchangeFailure, type ExchangeFailure } from '../exchange/failures';
import type { BalanceCondition } from './conditions';

const positive = (x: number) => Number.isFinite(x) && x > 0;

/** The first range problem of a surface's condition behind it (the radiation conditions are checked by the exchange rules), or null. */
export function checkCondition(
  c: BalanceCondition,
  surface: number,
  conditions: ReadonlyArray<BalanceCondition>,
): ExchangeFailure | null {
  const fail = (code: Parameters<typeof exchangeFailure>[0], value: number, more = {}) =>
    exchangeFailure(code, { surface, value, ...more });
  switch (c.kind) {
    case 'wall': {
      if (c.layers.length === 0) return exchangeFailure('wall-without-layers', { surface });
      for (let k = 0; k < c.layers.length; k++) {
        const l = c.layers[k];
        if (!positive(l.thickness)) return fail('layer-thickness-out-of-range', l.thickness, { layer: k });
        if (!positive(l.conductivity)) return fail('layer-conductivity-out-of-range', l.conductivity, { layer: k });
      }
      if (!positive(c.outsideTemperature)) return fail('outside-temperature-out-of-range', c.outsideTemperature);
      if (!positive(c.outsideCoefficient)) return fail('outside-coefficient-out-of-range', c.outsideCoefficient);
      const e = c.outsideEmissivity;
      if (e !== undefined && !(positive(e) && e <= 1)) return fail('outside-emissivity-out-of-range', e);
      return null;
    }
    case 'tube':
      if (!positive(c.fluidTemperature)) return fail('fluid-temperature-out-of-range', c.fluidTemperature);
      if (!positive(c.insideCoefficient)) return fail('inside-coefficient-out-of-range', c.insideCoefficient);
      if (!positive(c.wallConductivity)) return fail('tube-conductivity-out-of-range', c.wallConductivity);
      if (!positive(c.outerDiameter)) return fail('outer-diameter-out-of-range', c.outerDiameter);
      if (!(positive(c.innerDiameter) && c.innerDiameter < c.outerDiameter)) {
        return fail('inner-diameter-out-of-range', c.innerDiameter, { expected: c.outerDiameter });
      }
      return null;
    case 'linked': {
      const j = c.other;
      const back = Number.isInteger(j) && j >= 0 && j < conditions.length ? conditions[j] : undefined;
      if (!back) return exchangeFailure('link-not-mutual', { surface });
      if (j === surface || back.kind !== 'linked' || back.other !== surface) {
        return exchangeFailure('link-not-mutual', { surface, other: j });
      }
      return null;
    }
    default:
      return null;
  }
}

/** The first problem with the convection coefficients (W/(m^2 K)) and gas temperature (K), or null. */
export function checkConvection(
  h: ArrayLike<number> | undefined,
  gasTemperature: number | undefined,
  conditions: ReadonlyArray<BalanceCondition>,
): ExchangeFailure | null {
  if (gasTemperature !== undefined && !positive(gasTemperature)) {
    return exchangeFailure('gas-temperature-out-of-range', { value: gasTemperature });
  }
  if (!h) return null;
  if (h.length !== conditions.length) {
    return exchangeFailure('area-size', { value: h.length, expected: conditions.length });
  }
  for (let i = 0; i < h.length; i++) {
    if (!(Number.isFinite(h[i]) && h[i] >= 0))
      return exchangeFailure('convection-out-of-range', { surface: i, value: h[i] });
    if (h[i] > 0 && conditions[i].kind === 'opening') {
      return exchangeFailure('convection-on-opening', { surface: i, value: h[i] });
    }
    if (h[i] > 0 && gasTemperature === undefined) {
      return exchangeFailure('convection-without-gas', { surface: i, value: h[i] });
    }
  }
  return null;
}
