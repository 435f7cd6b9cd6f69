import { useEffect } from 'react';
import { useAppStore, useController, useDocumentApi } from '../AppContext';
import { toolRegistry } from '../../state/tools/registry';
import { OPEN_INPUT_ID } from './FileButtons';
import { saveSketchFile } from './saveFile';

/** Keys typed into a text field belong to the field; a focused checkbox or button does not take letters. */
function typingInField(target: EventTarget | null): boolean {
  const el = target as HTMLElement | null;
  if (!el) return false;
  if (el.tagName === 'INPUT')
    return !['checkbox', 'radio', 'button', 'file', 'range'].includes((el as HTMLInputElement).type);
  return el.tagName === 'TEXTAREA' || el.tagName === 'SELECT' || el.isContentEditable;
}

export function useShortcuts(): void {
  const store = useAppStore();
  const controller = useController();
  const api = useDocumentApi();
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (typingInField(e.target)) return;
      const s = store.getState();
      const key = e.key.toLowerCase();
      const mod = e.ctrlKey || e.metaKey;
      if (mod && key === 'z') {
        e.preventDefault();
        if (e.shiftKey) s.redo();
        else s.undo();
        return;
      }
      if (mod && key === 'y') {
        e.preventDefault();
        s.redo();
        return;
      }
      if (mod && key === 's') {
        e.preventDefault();
        saveSketchFile(store, api);
        return;
      }
      if (mod && (key === 'c' || key === 'v' || key === 'd')) {
        // Copy and paste act on shapes here; text fields (returned above) keep the browser's own.
        const done = key === 'c' ? controller.copy() : key === 'v' ? controller.paste() : controller.duplicate();
        if (done || key === 'd') e.preventDefault();
        return;
      }
      if (mod && key === 'o') {
        e.preventDefault();
        document.getElementById(OPEN_INPUT_ID)?.click();
        return;
      }
      if (mod || e.altKey) return;
      if (e.key === '?') {
        s.setHelpOpen(!s.helpOpen);
        return;
      }
      if (e.key === 'Escape') {
        if (s.helpOpen) s.setHelpOpen(false);
        else controller.cancel();
        return;
      }
      const deleting = e.key === 'Delete' || e.key === 'Backspace';
      if (deleting) e.preventDefault();
      // The active tool first: Enter finishes an outline, Delete while drawing drops its last point.
      if (controller.key(e.key)) {
        // The tool took it (Enter placing a typed point): a focused button must not also be pressed.
        e.preventDefault();
        return;
      }
      if (deleting) {
        controller.deleteSelection();
        return;
      }
      if (key === 'g') {
        s.setSnap(!s.snap);
        return;
      }
      if (key === 'f') {
        s.requestFit();
        return;
      }
      if (key === 'n') {
        s.setShowNames(!s.showNames);
        return;
      }
      const tool = toolRegistry.byShortcut(key);
      if (tool) s.setTool(tool.id);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [store, controller, api]);
}
