// What the studies panel offers to vary in the current sketch: each surface's
// emissivity and held temperature or heat flux, the position of each shape
// that has a surface name of its own (and a circle's radius), each tube row's
// pitch, diameter and distance from its wall, and the settings. Addresses are those of
// the command line (`hearth.temperature`), so a study reads the same in both.
import {
  describeParameter,
  parameterRefusal,
  parameterUnit,
  parameterValue,
  parseParameter,
  type StudyParameter,
} from '../../document/study';
import type { CheckedSketch } from '../documentApi';
import { documentApi } from '../documentApi';

export interface StudyChoice {
  /** As the command line writes it: "hearth.temperature", "settings.depth". */
  address: string;
  /** For people: "temperature of 'hearth'". */
  label: string;
  /** Unit of the values: K, W/m^2, m, the file's length unit, or '' (emissivity). */
  unit: string;
  /** The value in the sketch now, when it gives one. */
  current: number | undefined;
  /** Moving a shape or changing a tube row: every value needs new view factors (run in a worker). */
  geometry: boolean;
}

/** The parameters the sketch lets a study vary, surfaces in matrix order, then positions, tube rows, settings. */
export function studyChoices(sketch: CheckedSketch): StudyChoice[] {
  const names = documentApi.toScene(sketch).surfaceNames;
  const addresses: string[] = [];
  for (const name of names)
    for (const p of ['temperature', 'heatFlux', 'emissivity', 'convectionCoefficient']) addresses.push(`${name}.${p}`);
  for (const name of names) for (const p of ['x', 'y', 'radius']) addresses.push(`${name}.${p}`);
  for (const row of Object.keys(sketch.rows ?? {}))
    for (const p of ['pitch', 'diameter', 'distance']) addresses.push(`${row}.${p}`);
  addresses.push('settings.surroundingsTemperature', 'settings.depth', 'settings.gasTemperature');
  const choices: StudyChoice[] = [];
  for (const address of addresses) {
    const parsed = parseParameter(address);
    if (!parsed.ok || parameterRefusal(sketch, names, parsed.value)) continue;
    const p: StudyParameter = parsed.value;
    const current = parameterValue(sketch, p);
    // Convection and the gas temperature are offered where the file uses them (one needs the other).
    if (current === undefined && /\.(convectionCoefficient|gasTemperature)$/.test(address)) continue;
    choices.push({
      address,
      label: describeParameter(p),
      unit: parameterUnit(p, sketch.units),
      current,
      geometry: p.kind === 'shape' || p.kind === 'row',
    });
  }
  return choices;
}

/** A starting range around the current value (±20 %, emissivity kept in (0, 1]). */
export function suggestedRange(choice: StudyChoice): [number, number] {
  const v = choice.current;
  if (choice.address.endsWith('.emissivity')) return [Math.max(0.05, (v ?? 0.9) - 0.3), Math.min(1, (v ?? 0.9) + 0.1)];
  if (v === undefined) return choice.unit === 'K' ? [300, 600] : [1, 2];
  if (v === 0) return [-1, 1];
  const span = 0.2 * Math.abs(v);
  return [v - span, v + span];
}
