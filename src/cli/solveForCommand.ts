// `solve-for FILE --vary SURFACE.PROPERTY --from A --to B --target SURFACE.QUANTITY=VALUE [--steps N] [--json]`:
// the value of one parameter in [A, B] at which one surface's result equals
// VALUE. The range is scanned at N values (default 16), then Brent's method
// finds each crossing to 1e-9 of the value. --json prints {"value", "run"} and,
// when the target is met more than once, "values" with every root (value is the lowest).
import {
  DEFAULT_SCAN_STEPS,
  QUANTITY_UNIT,
  describeParameter,
  describeQuantity,
  parameterUnit,
  parseTarget,
  solveForTarget,
  targetQuantity,
} from '../document/study';
import { formatNumber } from '../document/labels';
import { parseArgs } from './args';
import type { CliIO } from './io';
import {
  STUDY_CAUTION,
  missingStudyOption,
  studyOptions,
  studySketch,
  studyViewFactors,
  type StudyArgs,
} from './sweepCommand';
import { THREADS_HELP } from './threads';
import { usageError as reportUsage } from './terminalText';

export const SOLVE_FOR_USAGE =
  'usage: npm run cli -- solve-for FILE --vary SURFACE.PROPERTY --from A --to B --target SURFACE.QUANTITY=VALUE [--steps N] [--json] [--threads N]';

const SOLVE_FOR_HELP = `${SOLVE_FOR_USAGE}

The value of one parameter, between A and B, at which a result of one surface
equals VALUE.
  --vary SURFACE.PROPERTY   as for sweep: temperature, emissivity, heatFlux,
                            convectionCoefficient, x, y, radius of a surface,
                            pitch, diameter, distance of a tube row,
                            or settings.surroundingsTemperature,
                            settings.gasTemperature, settings.depth
  --target SURFACE.QUANTITY=VALUE
                            QUANTITY: netHeat (W/m), netFlux (W/m^2),
                            temperature (K), radiosity (W/m^2); split on the
                            last '=' and the last '.' before it
  --steps N                 values scanned before the root search (default ${DEFAULT_SCAN_STEPS})
  --json                    {"value": v, "run": <exchange --json at v>}; when the
                            target is met more than once, value is the lowest
                            and "values" lists every one found
${THREADS_HELP}
The answer is found to 1e-9 of itself. A target not met in [A, B] is refused
with the range the result covers at the scanned values. A crossing and
recrossing between two scanned values is not seen: raise --steps.
${STUDY_CAUTION}
`;

/** Run the command; returns the exit code (0 done, 1 bad file or no answer, 2 bad arguments). */
export function runSolveFor(args: string[], io: CliIO): number {
  const study: StudyArgs = {};
  const parsed = parseArgs(args, studyOptions(study, true));
  if (parsed.kind === 'help') {
    io.out(SOLVE_FOR_HELP);
    return 0;
  }
  const usageError = (problem: string) => reportUsage(io, 'solve-for', SOLVE_FOR_USAGE, problem);
  if (parsed.kind === 'error') return usageError(parsed.problem);
  if (parsed.format === 'csv') return usageError('solve-for prints a table or --json, not --csv');
  const missing = missingStudyOption(study, false);
  if (missing) return usageError(missing);
  if (study.target === undefined) return usageError('give the target: --target SURFACE.QUANTITY=VALUE');
  const target = parseTarget(study.target);
  if (!target.ok) return usageError(`--target: ${target.message}`);
  const { format, file } = parsed;
  const p = study.vary!;
  const read = studySketch('solve-for', file, p, io);
  if (!read) return 1;
  const outcome = solveForTarget(
    read.sketch,
    read.names,
    p,
    study.from!,
    study.to!,
    target.value,
    study.steps ?? DEFAULT_SCAN_STEPS,
    studyViewFactors(study),
  );
  if (!outcome.ok) {
    io.err(`solve-for: ${file}: ${outcome.message}\n`);
    return 1;
  }
  const { value, values, run } = outcome;
  if (format === 'json') {
    io.out(`${JSON.stringify({ value, ...(values.length > 1 ? { values } : {}), run: run.json() })}\n`);
    return 0;
  }
  const unit = parameterUnit(p, read.sketch.units);
  const t = target.value;
  const shown = (v: number) => (unit === '' ? formatNumber(v) : `${formatNumber(v)} ${unit}`);
  const lines = [
    `${describeParameter(p)} = ${shown(value)} gives ${describeQuantity(t.surface, t.quantity)} = ` +
      `${formatNumber(targetQuantity(run, t))} ${QUANTITY_UNIT[t.quantity]} (target ${formatNumber(t.value)}).`,
  ];
  if (values.length > 1)
    lines.push(
      `The target is met ${values.length} times in the range, at ${values.map(shown).join(', ')}; the lowest is shown.`,
    );
  lines.push(STUDY_CAUTION);
  io.out(`${lines.join('\n')}\n`);
  return 0;
}
