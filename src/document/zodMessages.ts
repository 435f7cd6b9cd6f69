// Turns schema issues into short messages that say where (shape, point, edge
// or surface, counted from 1) and which rule, with the offending value.
import type { z } from 'zod';
import { describeValue, quoteName, shapeLabel } from './labels';
import { problemAt, type SketchProblem } from './problems';

/** The issue as a problem; it concerns a shape when its path runs through one. */
export function schemaProblem(issue: z.core.$ZodIssue, file: unknown): SketchProblem {
  const [head, index] = issue.path;
  const shapes = head === 'shapes' && typeof index === 'number' ? [index] : [];
  return problemAt('schema', formatSchemaIssue(issue, file), { shapes });
}

/** One message per issue; `file` is the raw document, used to label shapes. */
export function formatSchemaIssue(issue: z.core.$ZodIssue, file: unknown): string {
  const path = issue.path;
  const input = (issue as { input?: unknown }).input;
  const missing =
    input === undefined &&
    (issue.code === 'invalid_type' || issue.code === 'invalid_value' || issue.code === 'invalid_union');
  const what = missing ? `is missing; it ${issue.message}` : `${issue.message} (got ${describeReceived(issue, input)})`;
  if (issue.code === 'invalid_key' && (path[0] === 'surfaces' || path[0] === 'rows')) {
    const rule = issue.issues[0]?.message ?? `is not a valid ${path[0] === 'rows' ? 'row' : 'surface'} name`;
    return `${path[0]}: the name ${quoteName(String(path[path.length - 1] ?? input))} ${rule}`;
  }
  const { subject, field } = describePath(path, file);
  if (!field) return `${subject} ${what}`;
  return `${subject}: ${field} ${what}`;
}

function describeReceived(issue: z.core.$ZodIssue, input: unknown): string {
  // NaN and Infinity only come from objects (JSON cannot hold them); the issue names them.
  const received = (issue as { received?: unknown }).received;
  if (received === 'NaN' || received === 'Infinity') return received;
  if (typeof input === 'number' && !Number.isFinite(input)) return String(input);
  return describeValue(input);
}

function describePath(path: PropertyKey[], file: unknown): { subject: string; field: string } {
  const [head, ...rest] = path;
  if (head === undefined) return { subject: 'the sketch', field: '' };
  if (head === 'shapes' && typeof rest[0] === 'number') {
    const shapes = ((file ?? {}) as { shapes?: unknown[] }).shapes ?? [];
    return { subject: shapeLabel(rest[0], shapes[rest[0]]), field: shapeField(rest.slice(1)) };
  }
  if (head === 'surfaces' && rest.length > 0) {
    return { subject: `surface ${quoteName(String(rest[0]))}`, field: fieldPath(rest.slice(1)) };
  }
  if (head === 'settings' && rest.length > 0) return { subject: 'settings', field: rest.map(String).join(' ') };
  if (head === 'rows' && rest.length > 0)
    return { subject: `row ${quoteName(String(rest[0]))}`, field: fieldPath(rest.slice(1)) };
  return { subject: [head, ...rest].map(String).join(' '), field: '' };
}

/** A nested field as the file writes it, lists counted from 1: wall.layers[2].thickness. */
function fieldPath(keys: PropertyKey[]): string {
  return keys.map((k, i) => (typeof k === 'number' ? `[${k + 1}]` : `${i > 0 ? '.' : ''}${String(k)}`)).join('');
}

function shapeField(rest: PropertyKey[]): string {
  const [key, index, axis] = rest;
  if (key === undefined) return '';
  if (key === 'points' && typeof index === 'number') {
    const coordinate = axis === 0 ? ' x' : axis === 1 ? ' y' : axis === undefined ? '' : ` ${String(axis)}`;
    return `point ${index + 1}${coordinate}`;
  }
  if (key === 'surface' && typeof index === 'number') return `surface name of edge ${index + 1}`;
  return rest.map(String).join(' ');
}
