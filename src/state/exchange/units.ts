// Temperatures: kelvin in the file and the solver; the app shows and accepts
// K or degrees Celsius.
import type { TemperatureUnit } from './slice';
import { MAX_TEMPERATURE } from '../../document/propertyLimits';

/** 0 degrees Celsius in kelvin (exact by definition). */
export const ZERO_CELSIUS = 273.15;

export const TEMPERATURE_LABEL: Record<TemperatureUnit, string> = { K: 'K', C: '°C' };

/** A temperature in K as shown in `unit`; rounded to 12 digits so 1273.15 K shows as 1000 °C, not 1000.0000000000001. */
export function fromKelvin(kelvin: number, unit: TemperatureUnit): number {
  return unit === 'K' ? kelvin : Number((kelvin - ZERO_CELSIUS).toPrecision(12));
}

/** A temperature typed in `unit`, in K. */
export function toKelvin(value: number, unit: TemperatureUnit): number {
  return unit === 'K' ? value : value + ZERO_CELSIUS;
}

/** Why a typed temperature cannot be used, or null: above absolute zero and within the file's limit. */
export function temperatureProblem(value: number, unit: TemperatureUnit): string | null {
  if (!Number.isFinite(value)) return 'must be a number';
  const kelvin = toKelvin(value, unit);
  if (kelvin <= 0) return unit === 'K' ? 'must be above 0 K' : 'must be above absolute zero (−273.15 °C)';
  if (kelvin > MAX_TEMPERATURE) {
    return unit === 'K'
      ? `must be at most ${MAX_TEMPERATURE} K`
      : `must be at most ${fromKelvin(MAX_TEMPERATURE, 'C')} °C (${MAX_TEMPERATURE} K)`;
  }
  return null;
}

/** Why a typed value of a surface property or setting cannot be used, or null (the file's own rule). */
export { valueProblem, type ValueKind } from '../../document/exchange/valueChecks';
