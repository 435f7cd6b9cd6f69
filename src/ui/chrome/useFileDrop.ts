import { useEffect } from 'react';
import { useAppStore, useDocumentApi } from '../AppContext';
import { openSketchText } from '../../state/files';

/** Dropping a .json file anywhere on the page opens it. */
export function useFileDrop(): void {
  const store = useAppStore();
  const api = useDocumentApi();
  useEffect(() => {
    const over = (e: DragEvent) => {
      if (e.dataTransfer?.types.includes('Files')) e.preventDefault();
    };
    const drop = (e: DragEvent) => {
      const file = e.dataTransfer?.files?.[0];
      if (!file) return;
      e.preventDefault();
      void file.text().then((text) => openSketchText(store, api, text, file.name));
    };
    window.addEventListener('dragover', over);
    window.addEventListener('drop', drop);
    return () => {
      window.removeEventListener('dragover', over);
      window.removeEventListener('drop', drop);
    };
  }, [store, api]);
}
