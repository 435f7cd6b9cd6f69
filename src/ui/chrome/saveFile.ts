// Save (button, Ctrl+S, a notice's offer): download the sketch file. A sketch
// the program would not open again is still written, with a warning saying why.
import type { AppStore } from '../../state/store';
import type { DocumentApi } from '../../state/documentApi';
import { sketchFileText, unreadableReason } from '../../state/files';
import { downloadText } from './download';

export function saveSketchFile(store: AppStore, api: DocumentApi): void {
  downloadText('sketch.json', sketchFileText(store, api), 'application/json');
  const why = unreadableReason(store, api);
  if (why)
    store.getState().notify('warning', `Saved, but this program will not open the file until it is fixed: ${why}.`);
}
