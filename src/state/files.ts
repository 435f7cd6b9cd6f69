// New, Open and Save of the sketch file. A file that fails to read leaves the
// current sketch untouched and tells the user why.
import type { DocumentApi } from './documentApi';
import type { AppStore } from './store';
import { emptySketch } from './documentSlice';

export function newSketch(store: AppStore): void {
  const s = store.getState();
  s.commit({ ...emptySketch, units: s.doc.units });
  s.setSelection([]);
  s.setDraft([]);
}

/** Open a sketch from file text; returns whether it replaced the current sketch. */
export function openSketchText(store: AppStore, api: DocumentApi, text: string, fileName: string): boolean {
  const read = api.restore(text);
  const s = store.getState();
  if (!read.ok) {
    const more = read.errors.length > 4 ? ` (and ${read.errors.length - 4} more)` : '';
    const shown = read.errors
      .slice(0, 4)
      .map((e) => e.message)
      .join('; ');
    s.notify('error', `Could not open "${fileName}": ${shown}${more}. Your current sketch is unchanged.`);
    return false;
  }
  s.commit(read.sketch);
  s.setSelection([]);
  s.setDraft([]);
  s.requestFit();
  if (read.warnings.length)
    s.notify('warning', `Opened "${fileName}" with warnings: ${read.warnings.slice(0, 4).join('; ')}`);
  else s.notify('info', `Opened "${fileName}".`);
  return true;
}

export function sketchFileText(store: AppStore, api: DocumentApi): string {
  return api.serialize(store.getState().doc);
}
