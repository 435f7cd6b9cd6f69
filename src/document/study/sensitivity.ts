// The sensitivity table of a sketch: how each surface's net heat changes per
// unit change of each emissivity and each fixed temperature (derivatives of the
// solved balance, src/core/study/sensitivity.ts), with labels and units.
import {
  netHeatSensitivity,
  type SensitivityBase,
  type SensitivityInput,
  type SensitivityParameter,
} from '../../core/study';

export interface SensitivityRow {
  /** The parameter as the study commands address it: "hearth.emissivity", "settings.surroundingsTemperature". */
  parameter: string;
  /** Its unit in the derivative's denominator: '' (emissivity) or 'K'. */
  per: '' | 'K';
  /** Unit of the derivatives, e.g. "W/m per unit emissivity", "W/(m K)". */
  unit: string;
  /** d(net heat of surface i)/d(parameter), in `unit`; signed as net heat (positive: gives off more). */
  netHeat: number[];
  /** d(surroundings net heat)/d(parameter), when surfaces see the surroundings past the sketch's edges. */
  surroundingsNetHeat?: number;
}

export type SensitivityTableOutcome = { ok: true; rows: SensitivityRow[] } | { ok: false; message: string };

const EMISSIVITY_UNIT = 'W/m per unit emissivity';
const TEMPERATURE_UNIT = 'W/(m K)';

function address(p: SensitivityParameter, names: readonly string[]): string {
  if (p.kind === 'surroundingsTemperature') return 'settings.surroundingsTemperature';
  return `${names[p.surface]}.${p.kind}`;
}

/**
 * Rows of derivatives of net heat (W per metre of depth) for one solved exchange:
 * one row per emissivity (surfaces that are not openings), per fixed temperature
 * and for the surroundings temperature of an open sketch.
 */
export function sensitivityTable(
  names: readonly string[],
  input: SensitivityInput,
  result: SensitivityBase,
): SensitivityTableOutcome {
  const s = netHeatSensitivity(input, result);
  if (!s.ok)
    return {
      ok: false,
      message:
        'the radiosity equations, or the surface balance at its answer, are singular or too ill-conditioned to differentiate',
    };
  // The surroundings' own net heat moves only where surfaces see them past the sketch (openings count as surfaces).
  const open = result.surroundingsViewFactor.some((f) => f > 0);
  const rows = s.parameters.map((p, k): SensitivityRow => {
    const emissivity = p.kind === 'emissivity';
    return {
      parameter: address(p, names),
      per: emissivity ? '' : 'K',
      unit: emissivity ? EMISSIVITY_UNIT : TEMPERATURE_UNIT,
      netHeat: Array.from(s.netHeat[k]),
      ...(open ? { surroundingsNetHeat: s.surroundingsNetHeat[k] } : {}),
    };
  });
  return { ok: true, rows };
}
