// Selectors live at module level so components subscribe to stable functions.
import type { AppState } from './store';
import { surfaceIndex } from '../document/surfaceIndex';
import { shownResult } from './results/derive';

export const selectDoc = (s: AppState) => s.doc;
/** What the canvas draws: during a paced drag the newest position, which the document may not have taken yet. */
export const selectDrawnDoc = (s: AppState) => s.gesturePreview ?? s.doc;
export const selectUnits = (s: AppState) => s.doc.units;
export const selectTool = (s: AppState) => s.tool;
export const selectSelection = (s: AppState) => s.selection;
export const selectCamera = (s: AppState) => s.camera;
export const selectDraft = (s: AppState) => s.draft;
export const selectDigits = (s: AppState) => s.digits;
export const selectHoverPair = (s: AppState) => s.hoverPair;
export const selectNotices = (s: AppState) => s.notices;
export const selectHelpOpen = (s: AppState) => s.helpOpen;
export const selectViewFactors = (s: AppState) => s.viewFactors;
export const selectCanUndo = (s: AppState) => s.past.length > 0 && !s.gestureBase;
export const selectCanRedo = (s: AppState) => s.future.length > 0 && !s.gestureBase;
/** Surface factors as shown (see results/derive.ts); null before the first result. */
export const selectShown = (s: AppState) => shownResult(s.viewFactors);
/** True while the shown numbers belong to an older geometry than the one on screen. */
export const selectResultsStale = (s: AppState) => shownResult(s.viewFactors)?.stale ?? false;

// Per shapes array, so store updates that leave the shapes alone (hover, camera) cost a lookup.
const orders = new WeakMap<AppState['doc']['shapes'], ReadonlyMap<string, number>>();
/** Surface names of the document as drawn (valid or not) in table order: name to surface id. */
export const selectSurfaceOrder = (s: AppState): ReadonlyMap<string, number> => {
  let order = orders.get(s.doc.shapes);
  if (!order) orders.set(s.doc.shapes, (order = surfaceIndex(s.doc.shapes).order));
  return order;
};

export const selectFitRequest = (s: AppState) => s.fitRequest;
export const selectHoverPoint = (s: AppState) => s.hoverPoint;
