// Text helpers shared by the commands: what a terminal is shown.
import type { CliIO } from './io';

/** Names as plain text for a terminal: control characters (escape sequences) shown as '?', long names cut. */
export function displayName(name: string, longest = 24): string {
  // eslint-disable-next-line no-control-regex
  const clean = name.replace(/[\u0000-\u001f\u007f-\u009f]/g, '?');
  return clean.length > longest ? `${clean.slice(0, longest - 1)}…` : clean;
}

/** Report a bad command line as "<command>: <problem>" and the usage line; returns exit code 2. */
export function usageError(io: CliIO, command: string, usage: string, problem: string): number {
  io.err(`${command}: ${problem}\n${usage}\n`);
  return 2;
}
