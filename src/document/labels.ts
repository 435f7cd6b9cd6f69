// How messages name things. Shapes, points and edges are counted from 1 in
// every message (as a person counts them in the file); edge k runs from point
// k to point k+1 and the last edge closes the shape.

/** A number for a message: up to 10 significant digits, no trailing zeros. */
export function formatNumber(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  return String(Number(x.toPrecision(10)));
}

export function formatPoint([x, y]: readonly [number, number]): string {
  return `(${formatNumber(x)}, ${formatNumber(y)})`;
}

/**
 * A name as plain text: control characters (a terminal's escape sequences, line
 * breaks) shown as '?', and cut with '…' to at most `longest` characters.
 */
export function plainName(name: string, longest: number): string {
  // eslint-disable-next-line no-control-regex -- matching control characters is the point: they must not reach a terminal or a message
  const clean = name.replace(/[\u0000-\u001f\u007f-\u009f]/g, '?');
  return clean.length > longest ? `${clean.slice(0, longest - 1)}…` : clean;
}

/** A surface or field name in quotes, control characters shown as '?', long names cut. */
export function quoteName(name: string): string {
  return `'${plainName(name, 40)}'`;
}

/** A value that broke a rule, for "(got ...)". */
export function describeValue(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (value === null) return 'null';
  if (typeof value === 'string') return JSON.stringify(value.length > 30 ? `${value.slice(0, 29)}…` : value);
  if (typeof value === 'number') return formatNumber(value);
  if (typeof value === 'boolean') return String(value);
  if (Array.isArray(value)) return value.length === 0 ? 'an empty list' : `a list of ${value.length}`;
  if (typeof value === 'object') return 'an object';
  return typeof value;
}

/**
 * A shape as the canvas and the tables name it, with its number in the file
 * (counted from 1) as the place: "'tube 3' (body, shape 5)" for a shape that
 * is one surface, "the enclosure (shape 1)" or "body 'a'/'b' (shape 2)" for one
 * of several surfaces, and the row a tube belongs to ("…, row 'row 1'").
 * Reads whatever the file holds for shape `index` (0-based).
 */
export function shapeLabel(index: number, shape: unknown): string {
  const s = (shape ?? {}) as { kind?: unknown; surface?: unknown; row?: unknown };
  const kind = s.kind === 'enclosure' ? 'enclosure' : s.kind === 'solid' ? 'body' : '';
  const raw = typeof s.surface === 'string' ? [s.surface] : Array.isArray(s.surface) ? s.surface : [];
  const names = [...new Set(raw.filter((n): n is string => typeof n === 'string' && n !== ''))];
  const row = typeof s.row === 'string' && s.row !== '' ? `, row ${quoteName(s.row)}` : '';
  const place = `shape ${index + 1}${row}`;
  if (names.length === 1) return `${quoteName(names[0])} (${kind ? `${kind}, ` : ''}${place})`;
  if (names.length === 0) {
    const detail = [kind, row.slice(2)].filter(Boolean).join(', ');
    return detail ? `shape ${index + 1} (${detail})` : `shape ${index + 1}`;
  }
  if (kind === 'enclosure') return `the enclosure (${place})`;
  const shown = names.slice(0, 3).map(quoteName).join('/') + (names.length > 3 ? '/…' : '');
  return `${kind || 'shape'} ${shown} (${place})`;
}
