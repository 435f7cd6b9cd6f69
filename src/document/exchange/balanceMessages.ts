// The whole surface balance's failures in words (convection, walls, tubes,
// linked plates, Newton): the codes of src/core/exchange/failures.ts that
// src/core/balance returns. Field names are the file's, so a person can find them.
import type { ExchangeFailure } from '../../core/exchange';
import { formatNumber } from '../labels';

/**
 * The message for a balance failure; `at` names the surface ("surface 'roof'"),
 * `got` is the number concerned, `surface` names another surface by index.
 */
export function balanceFailureMessage(
  failure: ExchangeFailure,
  at: string,
  got: string,
  surface: (i: number | undefined) => string,
): string {
  const layer = `wall.layers[${(failure.layer ?? 0) + 1}]`;
  switch (failure.code) {
    case 'convection-out-of-range':
      return `${at}: convectionCoefficient must be a number of W/(m²·K) of 0 or more, got ${got}`;
    case 'convection-on-opening':
      return `${at}: an opening takes no convectionCoefficient (got ${got}); remove it`;
    case 'convection-without-gas':
      return `${at}: convectionCoefficient ${got} W/(m²·K) needs a gas temperature; set settings.gasTemperature`;
    case 'gas-temperature-out-of-range':
      return `gas temperature must be a finite number of kelvin above 0, got ${got}`;
    case 'wall-without-layers':
      return `${at}: wall.layers must list at least one layer`;
    case 'layer-thickness-out-of-range':
      return `${at}: ${layer}.thickness must be a number of metres above 0, got ${got}`;
    case 'layer-conductivity-out-of-range':
      return `${at}: ${layer}.conductivity must be a number of W/(m·K) above 0, got ${got}`;
    case 'outside-temperature-out-of-range':
      return `${at}: wall.outsideTemperature must be a number of kelvin above 0, got ${got}`;
    case 'outside-coefficient-out-of-range':
      return `${at}: wall.outsideCoefficient must be a number of W/(m²·K) above 0, got ${got}`;
    case 'outside-emissivity-out-of-range':
      return `${at}: wall.outsideEmissivity must be in (0, 1], got ${got}`;
    case 'fluid-temperature-out-of-range':
      return `${at}: tube.fluidTemperature must be a number of kelvin above 0, got ${got}`;
    case 'inside-coefficient-out-of-range':
      return `${at}: tube.insideCoefficient must be a number of W/(m²·K) above 0, got ${got}`;
    case 'tube-conductivity-out-of-range':
      return `${at}: tube.wallConductivity must be a number of W/(m·K) above 0, got ${got}`;
    case 'outer-diameter-out-of-range':
      return `${at}: tube.outerDiameter must be a number of metres above 0, got ${got}`;
    case 'inner-diameter-out-of-range':
      return `${at}: tube.innerDiameter must be above 0 and below the outer diameter (${formatNumber(failure.expected ?? Number.NaN)} m), got ${got}`;
    case 'link-not-mutual':
      return failure.other === undefined
        ? `${at}: linked names no surface of the sketch`
        : `${at}: linked to ${surface(failure.other)}, which is not linked back to it (a plate has two faces, each linked once)`;
    case 'balance-singular':
      return 'no unique answer: the surface balance is singular; check that every group of surfaces that see only each other has a surface held at a temperature, a wall, a tube, convection, an opening or a view to the surroundings';
    case 'no-convergence':
      return `no answer: the surface balance did not converge in ${formatNumber(failure.expected ?? Number.NaN)} iterations (largest residual ${(failure.value ?? Number.NaN).toExponential(1)} of the radiation leaving all surfaces); check for conditions that contradict each other`;
    case 'balance-below-absolute-zero':
      return `${at}: no physical answer: its balance would need a temperature below absolute zero (it must give off more heat than it receives); check its heat flux and what lies behind it`;
    default:
      return `${at}: the exchange could not be solved (${failure.code})`;
  }
}
