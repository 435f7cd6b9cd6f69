// Hostile files: names that are also properties of every JavaScript object,
// the one name the format reserves, deep nesting, megabyte names and huge
// files. Each is read as plain data or refused with one short message; never an
// exception, a stack trace or a hang. The command line (main() with files in
// memory) reads through the same reader, so it is checked here too.
import { describe, expect, it } from 'vitest';
import { readDraft, restore, serialize, MAX_FILE_CHARS, MAX_JSON_DEPTH, MAX_NAME_LENGTH } from '../../src/document';
import { main } from '../../src/cli/main';
import { nodeIO, type CliIO } from '../../src/cli/io';
import { mkdtempSync, rmSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

function run(args: string[], files: Record<string, string>) {
  let out = '';
  let err = '';
  const io: CliIO = {
    out: (t) => void (out += t),
    err: (t) => void (err += t),
    readFile: (path) => {
      if (!Object.hasOwn(files, path)) throw Object.assign(new Error('ENOENT'), { code: 'ENOENT' });
      return files[path];
    },
  };
  return { code: main(args, io), out, err };
}

/** A 3-4-5 triangle enclosure whose three edges carry the given names, with a condition on each. */
function triangle(names: [string, string, string]): string {
  const [a, b, c] = names;
  return `{"version":1,"units":"m","shapes":[{"kind":"enclosure","points":[[0,0],[3,0],[3,4]],"surface":${JSON.stringify(
    names,
  )}}],"surfaces":{${JSON.stringify(a)}:{"temperature":500,"emissivity":0.8},${JSON.stringify(
    b,
  )}:{"temperature":300},${JSON.stringify(c)}:{"adiabatic":true}}}`;
}

const objectNames: [string, string, string][] = [
  ['constructor', 'toString', 'hasOwnProperty'],
  ['valueOf', '__defineGetter__', 'isPrototypeOf'],
  ['prototype', 'length', '0'],
];

/** A stack trace line ("    at fn (file:line)") must never reach the user. */
const STACK = /^\s+at .+:\d+/m;

describe('names that are properties of every object', () => {
  it.each(objectNames)('%s, %s and %s read as plain names, with their properties', (a, b, c) => {
    const read = restore(triangle([a, b, c]));
    if (!read.ok) throw new Error(read.errors[0].message);
    expect(read.sketch.shapes[0].surface).toEqual([a, b, c]);
    // (Object key order puts integer-like names first; the order of surfaces comes from the edges.)
    expect(Object.keys(read.sketch.surfaces).sort()).toEqual([a, b, c].sort());
    expect(read.sketch.surfaces[a]).toEqual({ temperature: 500, emissivity: 0.8 });
    expect(read.sketch.surfaces[c]).toEqual({ adiabatic: true });
    expect(read.warnings).toEqual([]);
    const again = restore(serialize(read.sketch));
    expect(again.ok && again.sketch).toEqual(read.sketch);
  });

  it.each(objectNames)('the command line gives %s, %s, %s the numbers of plain names', (a, b, c) => {
    const files = { 'odd.json': triangle([a, b, c]), 'plain.json': triangle(['floor', 'wall', 'roof']) };
    for (const command of ['factors', 'exchange']) {
      const odd = run([command, 'odd.json', '--json'], files);
      const plain = run([command, 'plain.json', '--json'], files);
      expect(odd.err).toBe('');
      expect(odd.code).toBe(0);
      expect(plain.code).toBe(0);
      // Same sketch, other names: every number identical, names in the same places.
      const rename = (text: string) =>
        text
          .replaceAll('"floor"', JSON.stringify(a))
          .replaceAll('"wall"', JSON.stringify(b))
          .replaceAll('"roof"', JSON.stringify(c));
      expect(odd.out).toBe(rename(plain.out));
    }
  });

  it('"__proto__" and "constructor" are plain surface names: read, kept with their properties, solved and written back', () => {
    const text =
      '{"version":2,"units":"m","shapes":[{"kind":"enclosure","points":[[0,0],[3,0],[3,4]],"surface":["__proto__","constructor","c"]}],' +
      '"surfaces":{"__proto__":{"temperature":400},"constructor":{"temperature":300},"c":{"emissivity":0.5}}}';
    const read = restore(text);
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    const surfaces = read.sketch.surfaces;
    expect(Object.getPrototypeOf(surfaces)).toBe(Object.prototype);
    expect(Object.keys(surfaces)).toEqual(['__proto__', 'constructor', 'c']);
    expect(Object.getOwnPropertyDescriptor(surfaces, '__proto__')?.value).toEqual({ temperature: 400 });
    // Written back as read: the saved text holds the same names and properties.
    const again = restore(JSON.stringify(read.sketch));
    expect(again.ok && JSON.stringify(again.sketch)).toBe(JSON.stringify(read.sketch));
    const cli = run(['exchange', 'p.json', '--json'], { 'p.json': text });
    expect(cli.err).toBe('');
    expect(cli.code).toBe(0);
    const out = JSON.parse(cli.out) as { surfaces: { name: string; temperature: number }[] };
    expect(out.surfaces.map((s) => [s.name, s.temperature])).toEqual([
      ['__proto__', 400],
      ['constructor', 300],
      ['c', expect.any(Number) as number],
    ]);
    expect(cli.out).not.toMatch(STACK);
  });
});

describe('bounded reading', () => {
  const refusedWith = (text: string, pattern: RegExp) => {
    for (const read of [restore(text), readDraft(text)]) {
      expect(read.ok).toBe(false);
      if (read.ok) return;
      expect(read.errors.length).toBeGreaterThan(0);
      expect(read.errors[0].message).toMatch(pattern);
      for (const e of read.errors) expect(e.message.length).toBeLessThan(300);
    }
    const cli = run(['factors', 'f.json'], { 'f.json': text });
    expect(cli.code).toBe(1);
    expect(cli.out).toBe('');
    expect(cli.err).toMatch(pattern);
    expect(cli.err).not.toMatch(STACK);
    expect(cli.err.length).toBeLessThan(1000);
  };

  it('deeply nested lists and objects are refused before parsing', () => {
    const n = 500_000;
    refusedWith(
      '['.repeat(n) + ']'.repeat(n),
      new RegExp(`nest more than ${MAX_JSON_DEPTH} deep at line 1, column ${MAX_JSON_DEPTH + 1}`),
    );
    refusedWith('{"a":'.repeat(n) + '1' + '}'.repeat(n), /nest more than 32 deep/);
    // Deep nesting hidden in an unknown field of an otherwise good sketch.
    const deep = `{"version":1,"units":"m","shapes":[],"notes":${'['.repeat(40)}${']'.repeat(40)}}`;
    refusedWith(deep, /nest more than 32 deep/);
  });

  it('brackets inside names do not count as nesting', () => {
    const name = '[{'.repeat(40) + '\\"]';
    const read = restore(
      `{"version":1,"units":"m","shapes":[{"kind":"enclosure","points":[[0,0],[3,0],[3,4]],"surface":"${name}"}]}`,
    );
    expect(read.ok).toBe(true);
  });

  it('a megabyte name is refused with a short message naming the limit', () => {
    const big = 'n'.repeat(1 << 20);
    refusedWith(triangle([big, 'b', 'c']), new RegExp(`at most ${MAX_NAME_LENGTH} characters`));
    refusedWith(
      `{"version":1,"units":"m","shapes":[],"surfaces":{"${big}":{"temperature":400}}}`,
      new RegExp(`at most ${MAX_NAME_LENGTH} characters`),
    );
  });

  it('a megabyte field name in a file that is not a sketch: a short message', () => {
    refusedWith(`{"${'k'.repeat(1 << 20)}":1}`, /not a Tautline sketch: found fields "k+…"/);
  });

  it('a megabyte unknown field name is only a short warning', () => {
    const read = restore(`{"version":1,"units":"m","shapes":[],"${'k'.repeat(1 << 20)}":1}`);
    expect(read.ok).toBe(true);
    if (read.ok) expect(read.warnings.join('').length).toBeLessThan(200);
  });

  it(`a file over the size limit (${MAX_FILE_CHARS} characters) is refused before it is parsed`, () => {
    const padded = `{"version":1,"units":"m","shapes":[]${' '.repeat(MAX_FILE_CHARS)}}`;
    refusedWith(padded, /the file is 20 MB; the limit for a sketch file is 20 MB/);
    // Just under the limit still reads.
    const under = `{"version":1,"units":"m","shapes":[]${' '.repeat(MAX_FILE_CHARS - 40)}}`;
    expect(restore(under).ok).toBe(true);
  });

  it('the command line does not even read a file far past the limit (a sparse 100 MB file)', () => {
    const dir = mkdtempSync(join(tmpdir(), 'tautline-'));
    try {
      const path = join(dir, 'huge.json');
      writeFileSync(path, '');
      truncateSync(path, 100_000_000); // sparse: no disk space used
      const io = nodeIO();
      expect(() => io.readFile(path)).toThrow(/the file is 100 MB; the limit for a sketch file is 20 MB/);
      let err = '';
      const code = main(['factors', path], { ...io, out: () => {}, err: (t) => void (err += t) });
      expect(code).toBe(1);
      expect(err).toBe(`factors: cannot read '${path}': the file is 100 MB; the limit for a sketch file is 20 MB\n`);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
