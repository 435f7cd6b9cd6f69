// One value checked as it is typed, by the same rule the file reader applies
// (schema.ts, with the ranges of propertyLimits.ts), so the app never accepts a
// value that its own saved file would refuse.
import { valueSchemas } from '../schema';

export type ValueKind = keyof typeof valueSchemas;

/** Why `value` cannot be used for a field of this kind, or null when it can. */
export function valueProblem(kind: ValueKind, value: number): string | null {
  const r = valueSchemas[kind].safeParse(value);
  return r.success ? null : (r.error.issues[0]?.message ?? 'is not allowed');
}
