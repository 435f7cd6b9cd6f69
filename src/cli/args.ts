// The command line shared by the commands: one sketch file, --json or --csv, --help,
// and options of the command's own.

export type Format = 'table' | 'json' | 'csv';

export type ParsedArgs =
  { kind: 'help' } | { kind: 'error'; problem: string } | { kind: 'run'; format: Format; file: string };

/**
 * A command's own option: given the argument and a way to take the next one, return
 * undefined when the argument is not this option, null when it was read, or a problem.
 */
export type OwnOption = (arg: string, takeNext: () => string | undefined) => string | null | undefined;

/** Read `FILE [--json | --csv] [own options]`; argument text quoted in problems is cut to 40 characters. */
export function parseArgs(args: readonly string[], own?: OwnOption): ParsedArgs {
  let format: Format = 'table';
  const files: string[] = [];
  for (let k = 0; k < args.length; k++) {
    const arg = args[k];
    if (arg === '--help' || arg === '-h') return { kind: 'help' };
    if (arg === '--json' || arg === '--csv') {
      const wanted = arg === '--json' ? 'json' : 'csv';
      if (format !== 'table' && format !== wanted) return { kind: 'error', problem: 'choose one of --json and --csv' };
      format = wanted;
      continue;
    }
    const handled = own?.(arg, () => args[++k]);
    if (handled === null) continue;
    if (typeof handled === 'string') return { kind: 'error', problem: handled };
    if (arg.startsWith('-') && arg !== '-') return { kind: 'error', problem: `unknown option '${arg.slice(0, 40)}'` };
    files.push(arg);
  }
  if (files.length === 0) return { kind: 'error', problem: 'no sketch file given' };
  if (files.length > 1) return { kind: 'error', problem: `one sketch file at a time (got ${files.length})` };
  return { kind: 'run', format, file: files[0] };
}
