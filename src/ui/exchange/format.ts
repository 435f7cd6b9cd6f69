// Numbers in the heat-exchange panel.
import type { TemperatureUnit } from '../../state/exchange/slice';
import { fromKelvin } from '../../state/exchange/units';
import { fmtFactor } from '../matrix/format';

/** Heat, flux or power: five significant digits, no trailing zeros, never -0. */
export function fmtHeat(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  const v = Number(x.toPrecision(5));
  return v === 0 ? '0' : String(v);
}

/** A temperature (given in K) in the shown unit, two decimals, never -0.00. */
export function fmtTemperature(kelvin: number, unit: TemperatureUnit): string {
  return fmtFactor(fromKelvin(kelvin, unit), 2);
}

/** A number typed by the user, as it shows in a field: up to ten significant digits. */
export function fmtInput(x: number): string {
  return String(Number(x.toPrecision(10)));
}
