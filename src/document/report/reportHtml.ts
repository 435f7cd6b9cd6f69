// One self-contained HTML report of a sketch (inline CSS and SVG, nothing loaded
// from elsewhere), built from the same data as the command line's factors and
// exchange commands: the checked sketch, its named surfaces and their view
// factors; the exchange is solved here by solveSketchExchange, as the command
// line does. Used by `npm run cli -- report` and by the app's Report button.
import type { ViewFactorResult } from '../../core/scene';
import { solveSketchExchange } from '../exchangeInput';
import type { Sketch } from '../schema';
import { REPORT_CSS } from './css';
import { escapeMarkup } from './escape';
import { exchangeSection } from './exchangeSection';
import { factorsSection } from './factorsSection';
import { heatColours } from './heatColours';
import { inputsSection, propsOf } from './inputs';
import { wallProfiles } from './profiles';
import { sketchSvg, type SketchPicture } from './sketchSvg';
import { PROGRAM_NAME, PROGRAM_VERSION } from './version';
import { METHOD_TEXT, REFERENCES, REPORT_CAUTION } from './wording';

export interface ReportSource {
  /** The sketch file's name as shown (a path is fine). */
  fileName: string;
  /** SHA-256 of the file, lowercase hex. */
  sha256: string;
  /** What was hashed, e.g. "the file as read" (shown beside the hash). */
  hashOf: string;
  /** When the report was made. */
  date: Date;
  /** Program version (default: package.json's). */
  version?: string;
}

export interface ReportInput {
  source: ReportSource;
  /** The checked sketch (as restore returns it). */
  sketch: Sketch;
  /** Surface names in result order (toScene's order). */
  names: ReadonlyArray<string>;
  /** View factors of those surfaces (lengths in the sketch's units). */
  factors: ViewFactorResult;
  /**
   * The exchange already solved for these factors and the sketch's properties (the
   * app's results pipeline has it); when absent it is solved here, as the command line does.
   */
  exchange?: ReportExchange;
}

/** What the report needs of a solved exchange, or the solver's message. */
export type ReportExchange =
  | { ok: true; conditions: ReadonlyArray<Conditions[number]>; result: Solved['result'] }
  | { ok: false; message: string };

type Outcome = ReturnType<typeof solveSketchExchange>;
type Solved = Extract<Outcome, { ok: true }>;
type Conditions = Solved['input']['conditions'];

/** The exchange as the command line solves it, in the report's terms. */
function solveForReport(sketch: Sketch, names: ReadonlyArray<string>, factors: ViewFactorResult): ReportExchange {
  const o = solveSketchExchange(sketch, names, factors);
  return o.ok ? { ok: true, conditions: o.input.conditions, result: o.result } : { ok: false, message: o.message };
}

/** "sketch.json" -> "sketch-report.html" (directories dropped; any extension replaced). */
export function reportFileName(fileName: string): string {
  const base = fileName.split(/[\\/]/).pop() ?? '';
  const stem = base.replace(/\.[^.]*$/, '') || 'sketch';
  return `${stem}-report.html`;
}

/** The sketch's name for titles: the file name without directories and extension. */
export function sketchTitle(fileName: string): string {
  const base = fileName.split(/[\\/]/).pop() ?? '';
  return base.replace(/\.[^.]*$/, '') || 'sketch';
}

/** "2026-12-04 00:15 UTC". */
export function reportDate(date: Date): string {
  const iso = date.toISOString();
  return `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;
}

/** The picture's content for a sketch: its shapes, and heat colours (net flux) when given a result. */
export function sketchPicture(
  sketch: Pick<Sketch, 'shapes' | 'units'>,
  names: ReadonlyArray<string>,
  result?: Parameters<typeof heatColours>[1],
): SketchPicture {
  const picture: SketchPicture = { shapes: sketch.shapes, units: sketch.units };
  if (result && result.surfaceCount > 0) {
    const h = heatColours('netFlux', result);
    picture.heat = { colours: new Map(names.map((n, i) => [n, h.colours[i]])), legend: h };
  }
  return picture;
}

export function reportHtml({ source, sketch, names, factors, exchange }: ReportInput): string {
  const title = sketchTitle(source.fileName);
  const hasProperties = names.some((n) => propsOf(sketch, n) !== undefined);
  const outcome = hasProperties ? (exchange ?? solveForReport(sketch, names, factors)) : null;
  const solved = outcome?.ok ? outcome : null;

  const picture = sketchPicture(sketch, names, solved?.result);
  const svg = sketchSvg({ ...picture, title: `Cross-section of ${title}`, idPrefix: 'report', width: 520 });
  const caption = solved
    ? 'Coloured by net flux: blue takes heat up, orange gives it off.'
    : 'Each surface named on the side it radiates from.';

  let heat: { main: string; profiles: string };
  if (solved) {
    const ex = {
      names,
      units: sketch.units,
      lengths: factors.surfaceLength,
      conditions: solved.conditions,
      result: solved.result,
    };
    heat = exchangeSection(ex, wallProfiles(sketch.shapes, names));
  } else if (outcome && !outcome.ok) {
    heat = {
      main: `<section class="exchange failed"><h2>Heat exchange</h2><p><strong>No results:</strong> ${escapeMarkup(outcome.message)}</p></section>`,
      profiles: '',
    };
  } else {
    heat = {
      main:
        '<section class="exchange"><h2>Heat exchange</h2><p class="note">No surface has properties in the file, ' +
        'so no heat exchange was computed.</p></section>',
      profiles: '',
    };
  }

  const n = names.length;
  const version = source.version ?? PROGRAM_VERSION;
  // In print the list runs in two columns: date and program, file and units, then the hash.
  const meta: [string, string][] = [
    ['Date', escapeMarkup(reportDate(source.date))],
    ['Program', `${PROGRAM_NAME} ${escapeMarkup(version)}`],
    ['File', escapeMarkup(source.fileName)],
    ['Units', `lengths in ${escapeMarkup(sketch.units)}; ${n} surface${n === 1 ? '' : 's'}`],
    [
      'SHA-256',
      `<span class="hash" data-sha256>${escapeMarkup(source.sha256)}</span> (${escapeMarkup(source.hashOf)})`,
    ],
  ];
  return [
    '<!doctype html>',
    '<html lang="en"><head><meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<meta name="generator" content="${PROGRAM_NAME} ${escapeMarkup(version)}">`,
    `<title>Radiation report: ${escapeMarkup(title)}</title>`,
    `<style>${REPORT_CSS}</style></head><body><main class="report">`,
    `<header><h1>Radiation report: ${escapeMarkup(title)}</h1><dl class="meta">`,
    meta.map(([k, v]) => `<dt>${k}</dt><dd${k === 'SHA-256' ? ' class="wide"' : ''}>${v}</dd>`).join(''),
    '</dl></header>',
    `<div class="top"><figure>${svg}<figcaption>${caption}</figcaption></figure>`,
    inputsSection(sketch, names, factors.surfaceLength),
    '</div>',
    factorsSection(names, factors),
    heat.main,
    // Profiles beside the method, so a small sketch stays on one printed page.
    '<div class="pair">',
    heat.profiles,
    '<section class="method"><h2>Method</h2>',
    METHOD_TEXT.map((s) => `<p>${escapeMarkup(s)}</p>`).join(''),
    `<p class="refs">References: ${REFERENCES.map((r, k) => `[${k + 1}] ${escapeMarkup(r)}`).join(' ')}</p></section></div>`,
    `<aside class="caution" role="note"><strong>Caution:</strong> ${escapeMarkup(REPORT_CAUTION)}</aside>`,
    '</main></body></html>',
    '',
  ].join('\n');
}
