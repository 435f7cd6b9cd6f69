// Reading the text of a file: JSON with a message that says what kind of
// trouble and where (line and column), and a guess when it is another kind of file.
// Size and nesting are bounded before JSON.parse runs (limits.ts).
import { MAX_FILE_CHARS, MAX_JSON_DEPTH } from './limits';

export type ParseResult = { ok: true; value: unknown } | { ok: false; error: string };

export function parseJsonText(text: string): ParseResult {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text; // byte-order mark from some editors
  if (body.length > MAX_FILE_CHARS) {
    const mb = (n: number) => `${Math.round(n / 1e5) / 10} MB`;
    return {
      ok: false,
      error: `the file is ${mb(body.length)}; the limit for a sketch file is ${mb(MAX_FILE_CHARS)} (a sketch at the edge limit takes under 1 MB)`,
    };
  }
  if (body.trim() === '') return { ok: false, error: 'the file is empty' };
  const other = otherKindOfFile(body);
  if (other) return { ok: false, error: `not a Tautline sketch: this looks like ${other}, not a JSON sketch file` };
  const deep = tooDeep(body);
  if (deep !== null) {
    return {
      ok: false,
      error: `not a Tautline sketch: lists and objects nest more than ${MAX_JSON_DEPTH} deep at ${lineColumn(body, deep)} (a sketch nests 4 deep)`,
    };
  }
  try {
    return { ok: true, value: JSON.parse(body) };
  } catch (error) {
    return { ok: false, error: describeJsonError(body, error) };
  }
}

/** Offset of the first bracket that opens past MAX_JSON_DEPTH (outside strings), else null. One pass, no recursion. */
function tooDeep(text: string): number | null {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c)
        i++; // backslash: skip the escaped character
      else if (c === 0x22) inString = false;
    } else if (c === 0x22) inString = true;
    else if (c === 0x5b || c === 0x7b) {
      if (++depth > MAX_JSON_DEPTH) return i;
    } else if (c === 0x5d || c === 0x7d) depth--;
  }
  return null;
}

function otherKindOfFile(text: string): string | null {
  // eslint-disable-next-line no-control-regex -- control bytes early in the text are how a binary file is told apart
  if (/[\u0000-\u0008\u000e-\u001a]/.test(text.slice(0, 1024))) return 'a binary file';
  const start = text.trimStart();
  if (start.startsWith('%PDF')) return 'a PDF document';
  if (start.startsWith('<')) return 'an XML, SVG or HTML file';
  return null;
}

function describeJsonError(text: string, error: unknown): string {
  const message = error instanceof Error ? error.message : String(error);
  if (/unexpected end|end of (json )?(input|data)|unterminated/i.test(message)) {
    return 'not valid JSON: the file ends too early (truncated?)';
  }
  const at = errorOffset(text, message) ?? badStart(text);
  if (at !== null && at >= text.trimEnd().length) return 'not valid JSON: the file ends too early (truncated?)';
  if (at === null) return `not valid JSON (${message.split('\n', 1)[0].slice(0, 120)})`;
  return `not valid JSON at ${lineColumn(text, at)} near ${JSON.stringify(text.slice(at, at + 12))}`;
}

/** Character offset of a JSON.parse error, from the engine's message (V8: "position N"; Firefox: "line L column C"). */
function errorOffset(text: string, message: string): number | null {
  const position = /position (\d+)/.exec(message);
  if (position) return Number(position[1]);
  const lc = /line (\d+) column (\d+)/.exec(message);
  if (!lc) return null;
  const lines = text.split('\n');
  let offset = 0;
  for (let l = 0; l < Number(lc[1]) - 1 && l < lines.length; l++) offset += lines[l].length + 1;
  return offset + Number(lc[2]) - 1;
}

/** When the engine gives no position: the first character, if a JSON document cannot start with it. */
function badStart(text: string): number | null {
  const at = text.length - text.trimStart().length;
  return /[{["\d\-tfn]/.test(text.charAt(at)) ? null : at;
}

function lineColumn(text: string, offset: number): string {
  const before = text.slice(0, offset);
  const line = before.split('\n').length;
  const column = offset - before.lastIndexOf('\n');
  return `line ${line}, column ${column}`;
}
