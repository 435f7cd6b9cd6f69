// Writing a sketch as version-1 JSON: pretty, one point pair per [x, y] on a
// shape's points line, and a single surface name when all edges share it.
import { CURRENT_VERSION, type Sketch } from './schema';

export function serialize(sketch: Sketch): string {
  const shapes = sketch.shapes.map((shape) => {
    // A circle's list of names also gives its number of arcs, so it is kept as a list.
    const same =
      shape.surface.length > 0 &&
      shape.surface.every((n) => n === shape.surface[0]) &&
      !(shape.circle && shape.surface.length > 1);
    const surface = same
      ? JSON.stringify(shape.surface[0])
      : `[${shape.surface.map((n) => JSON.stringify(n)).join(', ')}]`;
    const points = `[${shape.points.map(([x, y]) => `[${num(x)}, ${num(y)}]`).join(', ')}]`;
    const c = shape.circle;
    const geometry = c
      ? `      "circle": { "center": [${num(c.center[0])}, ${num(c.center[1])}], "radius": ${num(c.radius)} },`
      : `      "points": ${points},`;
    const row = shape.row === undefined ? '' : `,\n      "row": ${JSON.stringify(shape.row)}`;
    return [
      '    {',
      `      "kind": ${JSON.stringify(shape.kind)},`,
      geometry,
      `      "surface": ${surface}${row}`,
      '    }',
    ].join('\n');
  });
  const lines = [
    '{',
    `  "version": ${CURRENT_VERSION},`,
    `  "units": ${JSON.stringify(sketch.units)},`,
    shapes.length === 0 ? '  "shapes": []' : `  "shapes": [\n${shapes.join(',\n')}\n  ]`,
  ];
  if (Object.keys(sketch.surfaces).length > 0)
    lines[lines.length - 1] += `,\n  "surfaces": ${indent(JSON.stringify(sketch.surfaces, null, 2))}`;
  if (Object.keys(sketch.settings).length > 0)
    lines[lines.length - 1] += `,\n  "settings": ${indent(JSON.stringify(sketch.settings, null, 2))}`;
  if (sketch.rows && Object.keys(sketch.rows).length > 0)
    lines[lines.length - 1] += `,\n  "rows": ${indent(JSON.stringify(sketch.rows, null, 2))}`;
  return `${lines.join('\n')}\n}\n`;
}

/** Shortest text that reads back as the same double; -0 is written as 0. */
function num(x: number): string {
  return JSON.stringify(x === 0 ? 0 : x);
}

function indent(json: string): string {
  return json.replace(/\n/g, '\n  ');
}
