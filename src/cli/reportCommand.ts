// `report FILE [--out PATH]`: one self-contained HTML report of a sketch file
// (src/document/report): the picture, the inputs, the view factors and, when
// surfaces have properties, the heat exchange, with the program's version, the
// date and the SHA-256 of the file. The same stages as `factors` and `exchange`:
// restore -> toScene -> core view factors -> solveSketchExchange (in the report).
import { createHash } from 'node:crypto';
import { dirname, join, resolve } from 'node:path';
import { writeFileSync } from 'node:fs';
import { toScene } from '../document';
import { reportFileName, reportHtml } from '../document/report';
import { describeReadError, type CliIO } from './io';
import { parseArgs } from './args';
import { threadedViewFactors, threadsOption, THREADS_HELP } from './threads';
import { readSketchFile } from './readSketch';
import { displayName, usageError as reportUsage } from './terminalText';

export const REPORT_USAGE = 'usage: npm run cli -- report FILE [--out PATH] [--threads N]';
const usageError = (io: CliIO, problem: string) => reportUsage(io, 'report', REPORT_USAGE, problem);

const REPORT_HELP = `${REPORT_USAGE}

Writes one self-contained HTML report of a sketch file (inline CSS and SVG,
nothing loaded from elsewhere; print it to PDF from a browser): the program's
version, the date, the SHA-256 of the file, the labelled cross-section, the
inputs (and which surfaces use default properties), the view factors with
row sums and the reciprocity residual, and when surfaces have properties the
net heat, the exchange matrix and the energy balance; the method and the
safety caution. Numbers as the factors and exchange commands print them.
  --out PATH   where to write (default: FILE's name with -report.html,
               beside it: sketch.json -> sketch-report.html); '-' prints
               the HTML on standard output
${THREADS_HELP}
FILE '-' reads standard input (then --out is needed).
`;

/** What the command needs beyond CliIO: writing the report, and the clock (tests give both). */
export interface ReportIO extends CliIO {
  writeFile?: (path: string, text: string) => void;
  now?: () => Date;
}

/** Run the command; returns the exit code (0 written, 1 bad file or cannot write, 2 bad arguments). */
export function runReport(args: string[], io: ReportIO): number {
  let out: string | undefined;
  const options: { threads?: number } = {};
  const parsed = parseArgs(args, (arg, takeNext) => {
    const threads = threadsOption(arg, takeNext, options);
    if (threads !== undefined) return threads;
    if (arg !== '--out' && !arg.startsWith('--out=')) return undefined;
    const path = arg === '--out' ? takeNext() : arg.slice('--out='.length);
    if (path === undefined || path === '') return '--out needs a file path';
    out = path;
    return null;
  });
  if (parsed.kind === 'help') {
    io.out(REPORT_HELP);
    return 0;
  }
  if (parsed.kind === 'error') return usageError(io, parsed.problem);
  if (parsed.format !== 'table') return usageError(io, 'the report is HTML; --json and --csv do not apply');
  const { file } = parsed;
  if (file === '-' && out === undefined) return usageError(io, 'reading standard input needs --out PATH');
  const target = out ?? join(dirname(file), reportFileName(file));
  if (target !== '-' && file !== '-' && resolve(target) === resolve(file))
    return usageError(io, '--out must not be the sketch file itself');

  // Read once: the hash is of the text the report is built from (UTF-8, as sha256sum sees a UTF-8 file).
  let text: string;
  try {
    text = io.readFile(file);
  } catch (error) {
    io.err(`report: ${describeReadError(file, error)}\n`);
    return 1;
  }
  const sketch = readSketchFile('report', file, { ...io, readFile: () => text });
  if (!sketch) return 1;
  const { scene, surfaceNames } = toScene(sketch);
  const factors = threadedViewFactors(scene, options.threads);
  if (!factors.F.every(Number.isFinite) || !factors.surfaceLength.every(Number.isFinite)) {
    io.err(`report: ${file}: internal error: the view factors came out non-finite; please report this file\n`);
    return 1;
  }
  const html = reportHtml({
    source: {
      fileName: file === '-' ? '(standard input)' : file,
      sha256: createHash('sha256').update(text, 'utf8').digest('hex'),
      hashOf: 'the file as read',
      date: io.now?.() ?? new Date(),
    },
    sketch,
    names: surfaceNames,
    factors,
  });
  if (target === '-') {
    io.out(html);
    return 0;
  }
  try {
    (io.writeFile ?? ((path, t) => writeFileSync(path, t, 'utf8')))(target, html);
  } catch (error) {
    io.err(`report: ${describeReadError(target, error).replace(/^cannot read/, 'cannot write')}\n`);
    return 1;
  }
  io.out(`report: wrote ${displayName(target, Infinity)}\n`);
  return 0;
}
