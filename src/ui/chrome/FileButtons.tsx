import { useRef } from 'react';
import { useAppStore, useDocumentApi } from '../AppContext';
import { newSketch, openSketchText } from '../../state/files';
import { saveSketchFile } from './saveFile';

export const OPEN_INPUT_ID = 'open-sketch-input';

export function FileButtons() {
  const store = useAppStore();
  const api = useDocumentApi();
  const input = useRef<HTMLInputElement>(null);
  const onFile = async (file: File | undefined) => {
    if (!file) return;
    openSketchText(store, api, await file.text(), file.name);
    if (input.current) input.current.value = '';
  };
  const save = () => saveSketchFile(store, api);
  return (
    <div className="group" role="group" aria-label="File">
      <button
        type="button"
        title="Start an empty sketch (undo brings the old one back)"
        onClick={() => newSketch(store)}
      >
        New
      </button>
      <button
        type="button"
        title="Open a sketch file (.json), or drop one on the page (Ctrl+O)"
        onClick={() => input.current?.click()}
      >
        Open…
      </button>
      <input
        id={OPEN_INPUT_ID}
        ref={input}
        type="file"
        accept=".json,application/json"
        hidden
        aria-label="Sketch file to open"
        onChange={(e) => void onFile(e.target.files?.[0])}
      />
      <button type="button" title="Download the sketch file (Ctrl+S)" onClick={save}>
        Save
      </button>
    </div>
  );
}
