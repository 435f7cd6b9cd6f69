// Autosave to localStorage. Only documents that pass validation are written,
// so a broken edit can never replace the last good copy. An autosave that no
// longer reads is moved aside under its own key (kept, not deleted).
import type { DocumentApi } from './documentApi';
import type { SketchFile } from './sketchFile';
import type { AppStore } from './store';

export const AUTOSAVE_KEY = 'tautline.sketch';
export const SET_ASIDE_PREFIX = 'tautline.sketch.unreadable.';

export interface StartupDocument {
  doc: SketchFile;
  /** Tells the user what happened, when something did. */
  notice?: { level: 'info' | 'warning'; text: string };
  fromAutosave: boolean;
}

export function loadAutosave(
  storage: Storage,
  api: DocumentApi,
  fallback: SketchFile,
  now = Date.now(),
): StartupDocument {
  let text: string | null = null;
  try {
    text = storage.getItem(AUTOSAVE_KEY);
  } catch {
    /* storage blocked: start fresh */
  }
  if (text === null) return { doc: fallback, fromAutosave: false };
  const read = api.restore(text);
  if (read.ok) {
    const notice = read.warnings.length
      ? {
          level: 'warning' as const,
          text: `Restored your last sketch with warnings: ${read.warnings.slice(0, 3).join('; ')}`,
        }
      : undefined;
    return { doc: read.sketch, notice, fromAutosave: true };
  }
  const key = `${SET_ASIDE_PREFIX}${new Date(now).toISOString()}`;
  let kept = true;
  try {
    storage.setItem(key, text);
    storage.removeItem(AUTOSAVE_KEY);
  } catch {
    kept = false;
  }
  const where = kept
    ? `It was kept in this browser's storage under the key "${key}".`
    : 'It could not be moved aside and is still stored.';
  return {
    doc: fallback,
    fromAutosave: false,
    notice: {
      level: 'warning',
      text: `The autosaved sketch could not be read (${read.errors
        .slice(0, 2)
        .map((e) => e.message)
        .join('; ')}). ${where} The demo was opened instead.`,
    },
  };
}

/** Write the document if it is valid: 'invalid' leaves the last good copy, 'failed' means storage refused it. */
function writeAutosave(storage: Storage, api: DocumentApi, doc: SketchFile): 'saved' | 'invalid' | 'failed' {
  if (!api.restore(doc).ok) return 'invalid';
  try {
    storage.setItem(AUTOSAVE_KEY, api.serialize(doc));
    return 'saved';
  } catch {
    return 'failed';
  }
}

/** Write the document if it is valid; returns whether it was written. */
export function saveAutosave(storage: Storage, api: DocumentApi, doc: SketchFile): boolean {
  return writeAutosave(storage, api, doc) === 'saved';
}

/** Save on every document change; returns the unsubscribe function. */
export function startAutosave(store: AppStore, storage: Storage, api: DocumentApi): () => void {
  let last = store.getState().doc;
  let warnedFull = false;
  return store.subscribe((s) => {
    if (s.gestureBase) return; // mid-drag: save once the drag ends
    if (s.doc === last) return;
    last = s.doc;
    if (writeAutosave(storage, api, s.doc) === 'failed' && !warnedFull) {
      warnedFull = true;
      s.notify('warning', 'Autosave failed: browser storage is full or blocked. Use Save to keep a copy.');
    }
  });
}
