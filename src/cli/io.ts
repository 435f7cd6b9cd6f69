// The command line's only contact with the outside world, so commands can be
// run in tests with a fake (collecting output, serving files from memory).
import { readFileSync } from 'node:fs';

export interface CliIO {
  /** Write text to standard output exactly as given (include the trailing newline). */
  out(text: string): void;
  /** Write text to standard error exactly as given (include the trailing newline). */
  err(text: string): void;
  /** Read a whole text file as UTF-8 ('-' means standard input). Throws on failure; see describeReadError. */
  readFile(path: string): string;
}

/** The real terminal and file system. */
export function nodeIO(): CliIO {
  return {
    out: (text) => void process.stdout.write(text),
    err: (text) => void process.stderr.write(text),
    readFile: (path) => readFileSync(path === '-' ? 0 : path, 'utf8'),
  };
}

/** One short line saying why a file could not be read (no stack trace, no internals). */
export function describeReadError(path: string, error: unknown): string {
  const code = (error as { code?: unknown } | null)?.code;
  const reason =
    code === 'ENOENT'
      ? 'no such file'
      : code === 'EISDIR'
        ? 'it is a directory, not a file'
        : code === 'EACCES' || code === 'EPERM'
          ? 'permission denied'
          : code === 'ENAMETOOLONG'
            ? 'the name is too long'
            : code === 'ENOTDIR'
              ? 'a part of the path is not a directory'
              : error instanceof Error && error.message
                ? firstLine(error.message)
                : 'unknown error';
  return `cannot read '${path}': ${reason}`;
}

function firstLine(text: string): string {
  const line = text.split('\n', 1)[0];
  return line.length > 200 ? `${line.slice(0, 200)}…` : line;
}
