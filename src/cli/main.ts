// Command-line entry: `npm run cli -- <command> FILE [options]`. Every failure
// ends as a short message on stderr and an exit code (1 bad input, 2 bad
// arguments), never a stack trace.
import { realpathSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { runExchange } from './exchangeCommand';
import { runFactors } from './factorsCommand';
import { runReport } from './reportCommand';
import { nodeIO, type CliIO } from './io';
import { runSensitivity } from './sensitivityCommand';
import { runSolveFor } from './solveForCommand';
import { runSweepCommand } from './sweepCommand';

const HELP = `Tautline command line: view factors and radiation exchange of a sketch file.

usage: npm run cli -- <command> FILE [options]

commands:
  factors FILE [--json | --csv]                     view factors between the named surfaces
  exchange FILE [--json | --csv] [--depth METRES]   gray-diffuse heat exchange per surface
  sweep FILE --vary S.P --from A --to B --steps N   the exchange at N values of one parameter
  solve-for FILE --vary S.P --from A --to B --target S.Q=V
                                                    the parameter value that meets a target
  sensitivity FILE [--json | --csv]                 change of net heat per emissivity and temperature
  report FILE [--out PATH]                          one self-contained HTML report (print it to PDF)

Run a command with --help for its options. FILE '-' reads standard input.
`;

const SHORT_USAGE =
  'usage: npm run cli -- <command> FILE [options]   (commands: factors, exchange, sweep, solve-for, sensitivity, report; --help for more)';

const commands: Record<string, (args: string[], io: CliIO) => number> = {
  factors: runFactors,
  exchange: runExchange,
  sweep: runSweepCommand,
  'solve-for': runSolveFor,
  sensitivity: runSensitivity,
  report: runReport,
};

/** Run one command line (arguments after the program name); returns the exit code. */
export function main(argv: string[], io: CliIO): number {
  try {
    const [command, ...rest] = argv;
    if (command === undefined) {
      io.err(`tautline: no command given\n${SHORT_USAGE}\n`);
      return 2;
    }
    if (command === '--help' || command === '-h' || command === 'help') {
      io.out(HELP);
      return 0;
    }
    const run = Object.hasOwn(commands, command) ? commands[command] : undefined;
    if (!run) {
      io.err(`tautline: unknown command '${command.slice(0, 40)}'\n${SHORT_USAGE}\n`);
      return 2;
    }
    return run(rest, io);
  } catch (error) {
    // A bug, not the user's fault: say so in one line, without internals.
    const detail = error instanceof Error ? error.message.split('\n', 1)[0].slice(0, 200) : String(error).slice(0, 200);
    io.err(`tautline: internal error: ${detail}\n`);
    return 1;
  }
}

function isEntryPoint(): boolean {
  try {
    return process.argv[1] !== undefined && import.meta.url === pathToFileURL(realpathSync(process.argv[1])).href;
  } catch {
    return false;
  }
}

if (isEntryPoint()) {
  // A reader that closes the pipe early (`| head`) is not an error worth a trace.
  process.stdout.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code === 'EPIPE') process.exit(0);
  });
  process.on('uncaughtException', (error) => {
    process.stderr.write(`tautline: internal error: ${error.message.split('\n', 1)[0]}\n`);
    process.exit(1);
  });
  process.exitCode = main(process.argv.slice(2), nodeIO());
}
