import { restore, type Sketch } from '../document';
import { describeReadError, type CliIO } from './io';

/** At most this many warnings are printed; the rest are counted. */
const MAX_WARNINGS = 5;

/**
 * Read and check the sketch file of a command. Problems go to stderr as
 * "<command>: <file>: <message>" lines; returns null when the command should exit 1.
 */
export function readSketchFile(command: string, file: string, io: CliIO): Sketch | null {
  let text: string;
  try {
    text = io.readFile(file);
  } catch (error) {
    io.err(`${command}: ${describeReadError(file, error)}\n`);
    return null;
  }
  const read = restore(text);
  if (!read.ok) {
    for (const e of read.errors) io.err(`${command}: ${file}: ${e.message}\n`);
    return null;
  }
  for (const m of read.warnings.slice(0, MAX_WARNINGS)) io.err(`${command}: ${file}: warning: ${m}\n`);
  if (read.warnings.length > MAX_WARNINGS)
    io.err(`${command}: ${file}: …and ${read.warnings.length - MAX_WARNINGS} more warnings\n`);
  if (read.sketch.shapes.length === 0) {
    io.err(`${command}: ${file}: the sketch has no shapes; nothing to compute\n`);
    return null;
  }
  return read.sketch;
}
