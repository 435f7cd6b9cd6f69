// The exchange's worker: solves one exchange job off the page's thread
// (background.ts) and posts the view back, its new arrays handed over. It
// keeps the last factors posted, so a property edit sends none (HeldFactors).
import { HeldFactors, type ExchangeMessage } from './solveJob';

const held = new HeldFactors();

self.onmessage = (event: MessageEvent<ExchangeMessage>) => {
  const { id, view, transfer } = held.answer(event.data);
  self.postMessage({ id, view }, { transfer });
};
