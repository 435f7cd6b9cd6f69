// Length units a sketch file may use. Results are reported in the file's units;
// only heat exchange (W per metre of depth) needs metres.

export const UNITS = ['m', 'cm', 'mm', 'in', 'ft'] as const;
export type Units = (typeof UNITS)[number];

/** Length of one file unit in metres (inch and foot exact by definition, 1959). */
export const METRES_PER_UNIT: Readonly<Record<Units, number>> = { m: 1, cm: 0.01, mm: 0.001, in: 0.0254, ft: 0.3048 };

/** The factor that turns a length in `from` units into one in `to` units (dimensionless). */
export function unitFactor(from: Units, to: Units): number {
  return METRES_PER_UNIT[from] / METRES_PER_UNIT[to];
}
