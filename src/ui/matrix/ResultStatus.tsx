import { useApp } from '../AppContext';
import { selectShown, selectViewFactors } from '../../state/selectors';

/** A small live indicator: are the numbers current, being recomputed, or stale? */
export function ResultStatus() {
  const vf = useApp(selectViewFactors);
  const shown = useApp(selectShown);
  const stale = shown?.stale ?? false;
  let text: string;
  let tone: string;
  switch (vf.status) {
    case 'empty':
      text = 'Nothing to compute yet: draw an enclosure or a body.';
      tone = 'idle';
      break;
    case 'computing':
      text = stale ? 'Recomputing… (numbers shown are one step behind)' : 'Computing…';
      tone = 'busy';
      break;
    case 'ready':
      text = `Up to date (${shown ? shown.elapsedMs.toFixed(1) : '–'} ms)`;
      tone = 'ok';
      break;
    case 'invalid':
      text = shown ? 'Sketch is invalid: numbers are for the last valid sketch.' : 'Sketch is invalid: no results.';
      tone = 'warn';
      break;
    case 'error':
      text = 'Calculation failed: see the message. Edit the sketch to try again.';
      tone = 'error';
      break;
  }
  return (
    <p className={`result-status ${tone}`} role="status" aria-live="polite" data-status={vf.status}>
      <span className="dot" aria-hidden="true" />
      {text}
    </p>
  );
}
