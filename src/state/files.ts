// New, Open and Save of the sketch file. A file that fails to read leaves the
// current sketch untouched and tells the user why. A sketch file whose drawing
// breaks a rule (saved mid-edit) opens as a draft: problems marked, no results
// until they are fixed, so whatever Save wrote, Open reads back.
import type { DocumentApi, SketchProblem } from './documentApi';
import type { AppStore } from './store';
import { emptySketch } from './documentSlice';

export function newSketch(store: AppStore): void {
  const s = store.getState();
  s.commit({ ...emptySketch, units: s.doc.units });
  s.setSelection([]);
  s.setDraft([]);
}

/** Up to four messages, then how many more. */
function listed(problems: readonly SketchProblem[]): string {
  const more = problems.length > 4 ? ` (and ${problems.length - 4} more)` : '';
  return `${problems
    .slice(0, 4)
    .map((e) => e.message)
    .join('; ')}${more}`;
}

/** Open a sketch from file text; returns whether it replaced the current sketch. */
export function openSketchText(store: AppStore, api: DocumentApi, text: string, fileName: string): boolean {
  const read = api.readDraft(text);
  const s = store.getState();
  if (!read.ok) {
    s.notify('error', `Could not open "${fileName}": ${listed(read.errors)}. Your current sketch is unchanged.`);
    return false;
  }
  // Results of the sketch that was open belong to another drawing: never show them for this one.
  s.setViewFactors({ edges: null });
  s.commit(read.doc);
  s.setSelection([]);
  s.setDraft([]);
  s.requestFit();
  if (read.problems.length > 0) {
    const n = read.problems.length;
    s.notify(
      'warning',
      `Opened "${fileName}" as a draft: ${n === 1 ? 'one problem' : `${n} problems`} to fix before results can be computed (marked on the drawing): ${listed(read.problems)}.`,
    );
  } else if (read.warnings.length)
    s.notify('warning', `Opened "${fileName}" with warnings: ${read.warnings.slice(0, 4).join('; ')}`);
  else s.notify('info', `Opened "${fileName}".`);
  return true;
}

/** The sketch file's text; a sketch that breaks a rule is written as it is (it opens again as a draft). */
export function sketchFileText(store: AppStore, api: DocumentApi): string {
  return api.serialize(store.getState().doc);
}

/**
 * Why the current sketch, once saved, would not open again (a name the file
 * format refuses), or null. Save still writes it, so nothing is lost.
 */
export function unreadableReason(store: AppStore, api: DocumentApi): string | null {
  const read = api.readDraft(store.getState().doc);
  return read.ok ? null : listed(read.errors);
}
