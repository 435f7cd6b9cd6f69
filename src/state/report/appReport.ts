// The report and pictures from the app: the same HTML builder and SVG picture as
// the command line (src/document/report), fed with what is on screen.
import {
  reportFileName,
  reportHtml,
  sketchSvg,
  heatColours,
  type ReportExchange,
  type SketchPicture,
} from '../../document/report';
import { edgeSurfaceNames } from '../../document/surfaceIndex';
import type { DocumentApi } from '../documentApi';
import { shownResult } from '../results/derive';
import type { AppState, AppStore } from '../store';

/** The exchange stage's answer in the report's terms; undefined lets the report solve it. */
function reportExchange(ex: AppState['exchange']): ReportExchange | undefined {
  if (ex.kind === 'solved' && !ex.stale) return { ok: true, conditions: ex.conditions, result: ex.result };
  if (ex.kind === 'error' && !ex.stale) return { ok: false, message: ex.message };
  return undefined;
}

/** The name Save gives the sketch file; the report is named after it. */
export const SKETCH_FILE_NAME = 'sketch.json';

export type AppReport = { ok: true; html: string; fileName: string } | { ok: false; message: string };

/**
 * Lowercase hex SHA-256 of a text's UTF-8 bytes (Web Crypto), or null where the
 * browser offers no hashing (pages not served over https or from localhost).
 */
export async function sha256Hex(text: string): Promise<string | null> {
  const subtle = globalThis.crypto?.subtle as SubtleCrypto | undefined;
  if (!subtle) return null;
  const digest = await subtle.digest('SHA-256', new TextEncoder().encode(text));
  return Array.from(new Uint8Array(digest), (b) => b.toString(16).padStart(2, '0')).join('');
}

/**
 * The report of the sketch on screen, or why there is none: results must be for
 * the current sketch (not a step behind, no problems), as the command line would
 * compute them from the saved file. The hash is of the file Save would write.
 */
export async function appReport(store: AppStore, api: DocumentApi, now = new Date()): Promise<AppReport> {
  const s = store.getState();
  const shown = shownResult(s.viewFactors);
  if (!shown) return { ok: false, message: 'No results yet: draw an enclosure or solids, then make the report.' };
  if (shown.stale)
    return {
      ok: false,
      message:
        'The results are not for the sketch as it is now: fix the problems or wait for the results, then make the report.',
    };
  const text = api.serialize(s.doc);
  // A copy of the factors: while the hash is awaited the pipeline may retire this answer and reuse its matrix.
  const factors = { ...shown.result, F: shown.result.F.slice() };
  const hash = await sha256Hex(text);
  const html = reportHtml({
    source: {
      fileName: SKETCH_FILE_NAME,
      sha256: hash ?? 'not available',
      hashOf: hash
        ? 'the sketch file as Save writes it'
        : 'the browser hashes only on pages served over https or from this computer',
      date: now,
    },
    sketch: shown.sketch,
    names: shown.names,
    factors,
    // The pipeline's own exchange for these factors (it is not stale: checked above), not a second solve.
    exchange: reportExchange(s.exchange),
  });
  return { ok: true, html, fileName: reportFileName(SKETCH_FILE_NAME) };
}

export interface PictureOptions {
  names: boolean;
  dimensions: boolean;
  /** Colour by the canvas's heat colouring (net flux when it is off). */
  heat: boolean;
}

/** Whether heat colours can be drawn: there is a solved exchange. */
export const canColourHeat = (s: AppState): boolean => s.exchange.kind === 'solved';

/** The current sketch as SVG text: names, dimensions and heat colours as asked. */
export function appPictureSvg(s: AppState, options: PictureOptions): string {
  const doc = s.doc;
  const picture: SketchPicture = {
    shapes: doc.shapes.map((shape) => ({
      kind: shape.kind,
      points: shape.points,
      surface: edgeSurfaceNames(shape),
      circle: shape.circle,
    })),
    units: doc.units,
    names: options.names,
    dimensions: options.dimensions,
    title: 'Cross-section',
    idPrefix: 'picture',
  };
  const ex = s.exchange;
  if (options.heat && ex.kind === 'solved' && ex.names.length > 0) {
    const quantity = s.heatColouring === 'temperature' ? 'temperature' : 'netFlux';
    const h = heatColours(quantity, ex.result, s.temperatureUnit === 'C');
    picture.heat = { colours: new Map(ex.names.map((n, i) => [n, h.colours[i]])), legend: h };
  }
  return sketchSvg(picture);
}
