// Selectors live at module level so components subscribe to stable functions.
import type { AppState } from './store';

export const selectDoc = (s: AppState) => s.doc;
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
/** True while the shown numbers belong to an older document than the one on screen. */
export const selectResultsStale = (s: AppState) =>
  s.viewFactors.shown !== null && s.viewFactors.shown.doc !== s.doc;

export const selectFitRequest = (s: AppState) => s.fitRequest;
export const selectHoverPoint = (s: AppState) => s.hoverPoint;
