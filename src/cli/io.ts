// The command line's only contact with the outside world, so commands can be
// run in tests with a fake (collecting output, serving files from memory).
import { readFileSync, statSync } from 'node:fs';
import { MAX_FILE_CHARS } from '../document';

/**
 * Largest file read, in bytes: UTF-8 takes at most 3 bytes per character the
 * reader counts, so a longer file is surely past the reader's limit. Checked
 * before reading, so a huge file never fills memory.
 */
const MAX_FILE_BYTES = 3 * MAX_FILE_CHARS;

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
    readFile: (path) => {
      const size = path === '-' ? 0 : statSync(path).size;
      if (size > MAX_FILE_BYTES) {
        const mb = (n: number) => `${Math.round(n / 1e5) / 10} MB`;
        const message = `the file is ${mb(size)}; the limit for a sketch file is ${mb(MAX_FILE_CHARS)}`;
        throw Object.assign(new Error(message), { code: 'EFBIG' });
      }
      return readFileSync(path === '-' ? 0 : path, 'utf8');
    },
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
