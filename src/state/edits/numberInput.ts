// Reading a number typed into a field: letters, non-finite and out-of-range
// values are refused with a reason (shown beside the field), never clamped.

export interface NumberRule {
  /** Smallest allowed value (inclusive unless minExclusive). */
  min?: number;
  minExclusive?: boolean;
  /** Largest allowed value, inclusive. */
  max?: number;
  integer?: boolean;
}

export type NumberReading = { ok: true; value: number } | { ok: false; problem: string };

/** A plain decimal number: optional sign, digits with one decimal point or comma, optional exponent. */
const DECIMAL = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)(e[+-]?\d+)?$/i;

/** The number in `text`, or why it cannot be used ("must be a whole number", "must be at most 256"). */
export function readNumber(text: string, rule: NumberRule = {}): NumberReading {
  const t = text.trim();
  if (t === '') return { ok: false, problem: 'enter a number' };
  if (!DECIMAL.test(t)) return { ok: false, problem: `"${t.slice(0, 20)}" is not a number` };
  const value = Number(t.replace(',', '.'));
  if (!Number.isFinite(value)) return { ok: false, problem: 'is too large' };
  if (rule.integer && !Number.isInteger(value)) return { ok: false, problem: 'must be a whole number' };
  if (rule.min !== undefined) {
    if (rule.minExclusive ? !(value > rule.min) : !(value >= rule.min))
      return { ok: false, problem: `must be ${rule.minExclusive ? 'greater than' : 'at least'} ${rule.min}` };
  }
  if (rule.max !== undefined && !(value <= rule.max)) return { ok: false, problem: `must be at most ${rule.max}` };
  return { ok: true, value };
}

/** Grid steps, sketch units: above 1e-6 and at most 1e4, so snapped coordinates stay exact and finite. */
export const GRID_STEP_RULE: NumberRule = { min: 1e-6, max: 1e4 };
/** Significant digits shown in the tables. */
export const DIGITS_RULE: NumberRule = { min: 1, max: 15, integer: true };
/** Coordinates, sketch units (the file's limit). */
export const COORDINATE_RULE: NumberRule = { min: -1e100, max: 1e100 };

/** A circle's diameter, sketch units: more than 0, within the file's coordinate range. */
export const DIAMETER_RULE: NumberRule = { min: 0, minExclusive: true, max: 1e100 };
