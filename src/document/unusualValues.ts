// Warnings for heat-exchange inputs that are legal but unusual (see
// propertyLimits.ts): a typo such as 12730 K for 1273 K is more likely than a
// real surface that hot.
import { formatNumber, quoteName } from './labels';
import { UNUSUAL_EMISSIVITY, UNUSUAL_TEMPERATURE } from './propertyLimits';
import type { SketchSettings, SurfaceProperties } from './schema';

const hot = (what: string, kelvin: number) =>
  `${what}: ${formatNumber(kelvin)} K is above ${UNUSUAL_TEMPERATURE} K, unusual for furnace work; check the value and its unit`;

/** One warning per unusual value of a surface's properties. */
export function unusualPropertyWarnings(name: string, props: SurfaceProperties): string[] {
  const out: string[] = [];
  const label = `surface ${quoteName(name)}`;
  const temperatures: [string, number | undefined][] = [
    ['temperature', props.temperature],
    ['wall.outsideTemperature', props.wall?.outsideTemperature],
    ['tube.fluidTemperature', props.tube?.fluidTemperature],
  ];
  for (const [field, t] of temperatures)
    if (t !== undefined && t > UNUSUAL_TEMPERATURE) out.push(hot(`${label} ${field}`, t));
  for (const [field, e] of [
    ['emissivity', props.emissivity],
    ['wall.outsideEmissivity', props.wall?.outsideEmissivity],
  ] as const) {
    if (e !== undefined && e < UNUSUAL_EMISSIVITY) {
      out.push(
        `${label} ${field}: ${formatNumber(e)} is below ${UNUSUAL_EMISSIVITY}, lower than polished silver or gold; check the value`,
      );
    }
  }
  return out;
}

/** Warnings for unusual settings. */
export function unusualSettingWarnings(settings: SketchSettings | undefined): string[] {
  const out: string[] = [];
  for (const field of ['surroundingsTemperature', 'gasTemperature'] as const) {
    const t = settings?.[field];
    if (t !== undefined && t > UNUSUAL_TEMPERATURE) out.push(hot(`settings.${field}`, t));
  }
  return out;
}
