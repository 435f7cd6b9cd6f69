// The heat-exchange tab: properties of the chosen surface, the sketch settings,
// and the results (table, energy balance, bar chart, caution). Everything edits
// the document through the store, so undo, redo and autosave apply.
import './exchange.css';
import { SurfaceProperties } from './SurfaceProperties';
import { ExchangeSettings } from './ExchangeSettings';
import { ExchangeResults } from './ExchangeResults';

export function ExchangeSlot() {
  return (
    <div className="exchange-frame">
      <div className="exchange">
        <SurfaceProperties />
        <ExchangeSettings />
        <ExchangeResults />
      </div>
    </div>
  );
}
