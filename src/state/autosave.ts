// Autosave to localStorage, so a closed tab or a crash loses nothing. Every
// change is written, a sketch that breaks a rule too (it restores as a draft,
// problems marked). Only a document the reader would refuse outright, e.g. a
// name the file format reserves, is not written: the last good copy stays. An
// autosave that no longer reads is moved aside under its own key (kept, not
// deleted). Storage that is full keeps the last copy it took; the page says so
// and offers to save to a file. One tab writes at a time (tabs/lease.ts).
import type { DocumentApi } from './documentApi';
import type { SketchFile } from './sketchFile';
import type { AppStore } from './store';
import { TabLease, type TabChannel } from './tabs/lease';

export const AUTOSAVE_KEY = 'tautline.sketch';
export const SET_ASIDE_PREFIX = 'tautline.sketch.unreadable.';

export interface StartupDocument {
  doc: SketchFile;
  /** Tells the user what happened, when something did. */
  notice?: { level: 'info' | 'warning'; text: string };
  fromAutosave: boolean;
}

function listed(messages: readonly string[], most: number): string {
  return messages.slice(0, most).join('; ') + (messages.length > most ? ` (and ${messages.length - most} more)` : '');
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
  const read = api.readDraft(text);
  if (read.ok) {
    if (read.problems.length > 0) {
      const text = `Restored your last sketch as a draft: it has problems to fix before results can be computed (marked on the drawing): ${listed(
        read.problems.map((p) => p.message),
        3,
      )}.`;
      return { doc: read.doc, notice: { level: 'warning', text }, fromAutosave: true };
    }
    const notice = read.warnings.length
      ? { level: 'warning' as const, text: `Restored your last sketch with warnings: ${listed(read.warnings, 3)}` }
      : undefined;
    return { doc: read.doc, notice, fromAutosave: true };
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
      text: `The autosaved sketch could not be read (${listed(
        read.errors.map((e) => e.message),
        2,
      )}). ${where} The demo was opened instead.`,
    },
  };
}

export type WriteOutcome =
  | 'saved'
  | 'unreadable' // the reader would refuse it: the last good copy stays
  | 'full'; // storage refused the write (full or blocked): the last copy it took stays

/** Write the document unless the reader would refuse it. */
export function writeAutosave(storage: Storage, api: DocumentApi, doc: SketchFile): WriteOutcome {
  if (!api.readDraft(doc).ok) return 'unreadable';
  try {
    storage.setItem(AUTOSAVE_KEY, api.serialize(doc));
    return 'saved';
  } catch {
    // QuotaExceededError, or storage blocked. A failed setItem leaves the old value in place.
    return 'full';
  }
}

/** Write the document unless the reader would refuse it; returns whether it was written. */
export function saveAutosave(storage: Storage, api: DocumentApi, doc: SketchFile): boolean {
  return writeAutosave(storage, api, doc) === 'saved';
}

export const FULL_TEXT =
  "Autosave failed: this browser's storage is full or blocked, so changes from now on are not kept in the browser (the last autosaved copy is kept). Save the sketch to a file to keep your work.";
/** Told to a tab that was not saving when the tab that was closes. */
export const RELEASED_TEXT =
  'The other tab with this sketch was closed. Take over here to save from this tab (its copy then replaces the one saved last).';
export const ELSEWHERE_TEXT =
  'This sketch is open in another tab, which autosaves it; changes made in this tab are not autosaved. Take over to autosave from this tab instead (the other tab then stops).';
export const TAKEN_TEXT =
  'Autosaving from this tab. The other tab has stopped saving; its unsaved changes stay on its screen until it is closed.';

export interface AutosaveOptions {
  /** Channel to the other tabs of this site; null: this tab assumes it is the only one (still checked before each write). */
  channel?: TabChannel | null;
  /** Fixed tab id (tests). */
  tabId?: string;
}

/** Save on every document change; returns the stop function (which also lets other tabs take over). */
export function startAutosave(
  store: AppStore,
  storage: Storage,
  api: DocumentApi,
  options: AutosaveOptions = {},
): () => void {
  const startDoc = store.getState().doc;
  let last = startDoc;
  let fullNotice: number | null = null;
  let unreadableWarned = false;
  let elsewhereNotice: number | null = null;

  const write = (doc: SketchFile) => {
    if (!lease.mayWrite()) return;
    const s = store.getState();
    const outcome = writeAutosave(storage, api, doc);
    if (outcome === 'full' && fullNotice === null) {
      fullNotice = s.notify('warning', FULL_TEXT, { kind: 'save-file', label: 'Save to a file' });
    } else if (outcome === 'saved' && fullNotice !== null) {
      s.dismissNotice(fullNotice);
      fullNotice = null;
      s.notify('info', 'Autosave works again: the sketch is kept in this browser.');
    }
    if (outcome === 'unreadable' && !unreadableWarned) {
      unreadableWarned = true;
      const read = api.readDraft(doc);
      const why = read.ok
        ? ''
        : ` (${listed(
            read.errors.map((e) => e.message),
            2,
          )})`;
      s.notify(
        'warning',
        `Autosave paused: the sketch as it is could not be read back${why}; the last autosaved copy is kept. Fix it, or save to a file.`,
        { kind: 'save-file', label: 'Save to a file' },
      );
    } else if (outcome === 'saved') unreadableWarned = false;
  };

  const takeOver = () => {
    const s = store.getState();
    if (elsewhereNotice !== null) s.dismissNotice(elsewhereNotice);
    elsewhereNotice = null;
    // Untouched here since it opened: carry on from the other tab's latest copy, so none of its work is lost.
    if (s.doc === startDoc) {
      const latest = loadAutosave(storage, api, s.doc);
      if (latest.fromAutosave && latest.doc !== s.doc) {
        s.setViewFactors({ edges: null });
        s.commit(latest.doc);
      }
    }
    lease.takeOver();
    last = store.getState().doc;
    write(last);
    s.notify('info', TAKEN_TEXT);
  };

  const lease = new TabLease({
    storage,
    channel: options.channel ?? null,
    id: options.tabId,
    onChange: (state) => {
      // The lease came free after a wait: write what changed meanwhile.
      if (state === 'holder' && store.getState().doc !== startDoc) write(store.getState().doc);
      if (state !== 'elsewhere' || elsewhereNotice !== null) return;
      elsewhereNotice = store
        .getState()
        .notify('warning', ELSEWHERE_TEXT, { kind: 'run', label: 'Take over here', run: takeOver });
    },
    onReleased: () => {
      store.getState().notify('info', RELEASED_TEXT, { kind: 'run', label: 'Take over here', run: takeOver });
    },
  });

  const unsubscribe = store.subscribe((s) => {
    if (s.gestureBase) return; // mid-drag: save once the drag ends
    if (s.doc === last) return;
    last = s.doc;
    write(s.doc);
  });
  return () => {
    unsubscribe();
    lease.release();
  };
}
