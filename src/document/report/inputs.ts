// The report's inputs: per surface its edges, length, emissivity and condition,
// which surfaces fall back on the defaults, and the sketch's settings.
import { DEFAULT_CONDITION, DEFAULT_EMISSIVITY } from '../../core/exchange';
import { conditionOf } from '../exchange/conditions';
import { CONDITION_LABEL } from '../exchange/labels';
import type { Sketch, SurfaceProperties } from '../schema';
import { length8, sig6 } from './format';
import { htmlTable, num, rowHead, text, type Cell } from './table';
import { escapeMarkup } from './escape';

/** A surface's properties as the file gives them (own keys only), or undefined. */
export function propsOf(sketch: Pick<Sketch, 'surfaces'>, name: string): SurfaceProperties | undefined {
  const s = sketch.surfaces ?? {};
  return Object.hasOwn(s, name) ? s[name] : undefined;
}

export interface DefaultUse {
  name: string;
  emissivity: boolean;
  condition: boolean;
}

/** Which surfaces take the default emissivity or condition (openings are black whatever is given). */
export function defaultUses(sketch: Pick<Sketch, 'surfaces'>, names: ReadonlyArray<string>): DefaultUse[] {
  const out: DefaultUse[] = [];
  for (const name of names) {
    const p = propsOf(sketch, name);
    const c = conditionOf(p);
    const condition = c.ok && c.condition === undefined;
    const opening = c.ok && c.condition?.kind === 'opening';
    const emissivity = !opening && p?.emissivity === undefined;
    if (condition || emissivity) out.push({ name, emissivity, condition });
  }
  return out;
}

/** What the file gives behind a surface, in words with units (the numbers as written). */
function givenValue(p: SurfaceProperties | undefined): Cell {
  if (p?.temperature !== undefined) return num(`${sig6(p.temperature)} K`, p.temperature);
  if (p?.heatFlux !== undefined) return num(`${sig6(p.heatFlux)} W/m²`, p.heatFlux);
  if (p?.wall) {
    const w = p.wall;
    const layers = w.layers.map((l) => `${sig6(l.thickness)} m at ${sig6(l.conductivity)} W/(m·K)`).join(', ');
    const casing = w.outsideEmissivity === undefined ? '' : `, casing ε ${sig6(w.outsideEmissivity)}`;
    return text(
      `layers ${layers}; outside ${sig6(w.outsideTemperature)} K, ${sig6(w.outsideCoefficient)} W/(m²·K)${casing}`,
    );
  }
  if (p?.tube) {
    const t = p.tube;
    return text(
      `fluid ${sig6(t.fluidTemperature)} K, ${sig6(t.insideCoefficient)} W/(m²·K); diameters ${sig6(t.outerDiameter)} / ` +
        `${sig6(t.innerDiameter)} m; wall ${sig6(t.wallConductivity)} W/(m·K)`,
    );
  }
  if (p?.linked !== undefined) return text(`back faces ${p.linked}`);
  return text('');
}

/** The given value as a cell that may wrap (walls and tubes take a sentence). */
function givenCell(p: SurfaceProperties | undefined): Cell {
  return { ...givenValue(p), wrap: true };
}

export function inputsSection(sketch: Sketch, names: ReadonlyArray<string>, lengths: ArrayLike<number>): string {
  const edges = new Map<string, number>();
  for (const shape of sketch.shapes) for (const n of shape.surface) edges.set(n, (edges.get(n) ?? 0) + 1);
  const convection = names.some((n) => propsOf(sketch, n)?.convectionCoefficient !== undefined);
  const rows = names.map((name, i) => {
    const p = propsOf(sketch, name);
    const h = p?.convectionCoefficient;
    const c = conditionOf(p);
    const kind = c.ok ? (c.condition ?? DEFAULT_CONDITION).kind : undefined;
    const isDefault = c.ok && c.condition === undefined;
    const emissivity =
      kind === 'opening'
        ? text('1 (opening)')
        : p?.emissivity !== undefined
          ? num(sig6(p.emissivity), p.emissivity)
          : num(`${DEFAULT_EMISSIVITY} (default)`, DEFAULT_EMISSIVITY);
    const condition = kind === undefined ? 'more than one (refused)' : CONDITION_LABEL[kind];
    return [
      rowHead(name),
      num(String(edges.get(name) ?? 0), edges.get(name) ?? 0),
      num(length8(lengths[i]), lengths[i]),
      emissivity,
      text(isDefault ? `${condition} (default)` : condition),
      givenCell(p),
      ...(convection ? [h === undefined ? text('') : num(sig6(h), h)] : []),
    ];
  });
  const table = htmlTable({
    name: 'inputs',
    head: [
      text('surface'),
      text('edges'),
      text(`length (${sketch.units})`),
      text('ε'),
      text('condition'),
      text('given'),
      ...(convection ? [text('h (W/(m²·K))')] : []),
    ],
    rows,
    rowKeys: names,
  });
  const uses = defaultUses(sketch, names);
  const defaults =
    uses.length === 0
      ? 'Every surface has its own emissivity and condition.'
      : `Defaults (emissivity ${DEFAULT_EMISSIVITY}, ${CONDITION_LABEL[DEFAULT_CONDITION.kind]}) used by: ` +
        uses
          .map((u) => {
            const what = u.emissivity && u.condition ? 'both' : u.emissivity ? 'emissivity' : 'condition';
            return `${escapeMarkup(u.name)} (${what})`;
          })
          .join(', ') +
        '.';
  const st = sketch.settings ?? {};
  const settings = [
    `Surroundings temperature: ${st.surroundingsTemperature === undefined ? 'not set' : `${sig6(st.surroundingsTemperature)} K`}`,
    `gas temperature: ${st.gasTemperature === undefined ? 'not set' : `${sig6(st.gasTemperature)} K`}`,
    `depth: ${st.depth === undefined ? 'not set (results per metre of depth)' : `${sig6(st.depth)} m`}`,
  ].join('; ');
  return (
    `<section class="inputs"><h2>Inputs</h2>${table}` +
    `<p class="note" data-defaults>${defaults}</p><p class="note">${escapeMarkup(settings)}.</p></section>`
  );
}
