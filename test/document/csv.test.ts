import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import fc from 'fast-check';
import { matrixCsv, toCsv } from '../../src/document';

// CSV rules: RFC 4180 (quoting, CRLF records); formula-injection guard as
// recommended by OWASP ("CSV Injection": prefix cells that start with
// =, +, -, @, tab or carriage return) - common practice.

describe('CSV export', () => {
  it('writes RFC 4180 records with CRLF and quotes only where needed', () => {
    expect(
      toCsv([
        ['a', 'b'],
        [1, 2.5],
      ]),
    ).toBe('a,b\r\n1,2.5\r\n');
    expect(toCsv([['x, y', 'say "hi"', 'two\nlines']])).toBe('"x, y","say ""hi""","two\nlines"\r\n');
  });

  it('neutralises names a spreadsheet would run as formulas, but not numbers', () => {
    const out = toCsv([
      ['=SUM(A1:A9)', '+1', '-x', '@cmd', '\tq', '\rr', '=a\nb', 'safe'],
      [-0.5, 1e-17, 0, 1, 2, 3, 4, 5],
    ]);
    const [names, values] = Papa.parse<string[]>(out.trimEnd(), { newline: '\r\n', delimiter: ',' }).data;
    expect(names).toEqual(["'=SUM(A1:A9)", "'+1", "'-x", "'@cmd", "'\tq", "'\rr", "'=a\nb", 'safe']);
    expect(values.map(Number)).toEqual([-0.5, 1e-17, 0, 1, 2, 3, 4, 5]);
  });

  it('round-trips any names and full-precision numbers through a CSV reader', () => {
    fc.assert(
      fc.property(
        fc.array(fc.string({ minLength: 1 }), { minLength: 1, maxLength: 5 }),
        fc.double({ noNaN: true, noDefaultInfinity: true }),
        (names, x) => {
          const n = names.length;
          const matrix = Float64Array.from({ length: n * n }, (_, k) => x * (k + 1));
          const rows = Papa.parse<string[]>(matrixCsv(names, matrix).slice(0, -2), {
            newline: '\r\n',
            delimiter: ',',
          }).data;
          expect(rows).toHaveLength(n + 1);
          const guarded = names.map((s) => (/^[=+\-@\t\r]/.test(s) ? `'${s}` : s));
          expect(rows[0].slice(1)).toEqual(guarded);
          for (let i = 0; i < n; i++) {
            expect(rows[i + 1][0]).toBe(guarded[i]);
            expect(rows[i + 1].slice(1).map(Number)).toEqual(
              Array.from(matrix.subarray(i * n, (i + 1) * n)).map((v) => (Object.is(v, -0) ? 0 : v)),
            );
          }
        },
      ),
      { numRuns: 200 },
    );
  });
});
