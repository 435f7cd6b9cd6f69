// The exchange solve for what is on screen: the newest view-factor result and
// the properties that belong to its geometry.
import { solveSketchExchange } from '../document/exchangeInput';
import type { ShownResult } from './resultsSlice';
import type { ExchangeView } from './exchangeSlice';
import type { SketchFile } from './sketchFile';

/** True when the view factors were computed for the current document's geometry (same shapes, same units). */
export function sameGeometry(a: SketchFile, b: SketchFile): boolean {
  return a.shapes === b.shapes && a.units === b.units;
}

/**
 * The document whose surface properties and settings go with `shown`: the
 * current one when only properties changed since (its view factors still hold,
 * so a property edit shows at once), else the one the factors were computed
 * for, so names and properties always match the geometry solved.
 */
export function propertySource(shown: ShownResult, doc: SketchFile): SketchFile {
  return sameGeometry(shown.doc, doc) ? doc : shown.doc;
}

/** Solve the exchange for the shown view factors; messages instead of exceptions. */
export function deriveExchange(shown: ShownResult | null, doc: SketchFile): ExchangeView {
  if (!shown) return { kind: 'none' };
  const stale = !sameGeometry(shown.doc, doc);
  const source = propertySource(shown, doc);
  // Lengths are in the units of the geometry the factors belong to.
  const part = { units: shown.doc.units, surfaces: source.surfaces, settings: source.settings };
  const outcome = solveSketchExchange(part, shown.surfaceNames, shown.result);
  if (!outcome.ok) {
    const surface = outcome.surface === undefined ? undefined : shown.surfaceNames[outcome.surface];
    return { kind: 'error', message: outcome.message, surface, stale };
  }
  return {
    kind: 'solved',
    names: shown.surfaceNames,
    lengths: shown.result.surfaceLength,
    units: shown.doc.units,
    conditions: [...outcome.input.conditions],
    result: outcome.result,
    stale,
  };
}
