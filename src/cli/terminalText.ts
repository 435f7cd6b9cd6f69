// Text helpers shared by the commands: what a terminal is shown.
import type { CliIO } from './io';
import { plainName } from '../document/labels';

/** Names as plain text for a terminal: control characters (escape sequences) shown as '?', long names cut. */
export function displayName(name: string, longest = 24): string {
  return plainName(name, longest);
}

/** Report a bad command line as "<command>: <problem>" and the usage line; returns exit code 2. */
export function usageError(io: CliIO, command: string, usage: string, problem: string): number {
  io.err(`${command}: ${problem}\n${usage}\n`);
  return 2;
}
