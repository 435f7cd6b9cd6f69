import { useApp } from '../AppContext';
import { selectViewFactors } from '../../state/selectors';
import { selectExchange } from '../../state/exchange/selectors';

/** Are the exchange numbers current, a step behind, or for the last valid sketch? */
export function ExchangeStatus() {
  const ex = useApp(selectExchange);
  const vf = useApp(selectViewFactors);
  let text: string;
  let tone: string;
  if (ex.kind === 'none') {
    text =
      vf.status === 'empty'
        ? 'Nothing to compute yet.'
        : vf.status === 'invalid'
          ? 'Sketch is invalid: no results.'
          : vf.status === 'ready'
            ? 'Solving the heat balance…' // a large sketch, in the exchange's worker
            : 'Waiting for the view factors…';
    tone = vf.status === 'invalid' ? 'warn' : 'idle';
  } else if (!ex.stale) {
    text = ex.kind === 'error' ? 'No answer for these properties: see the message.' : 'Up to date';
    tone = ex.kind === 'error' ? 'error' : 'ok';
  } else if (vf.status === 'invalid') {
    text = 'Sketch is invalid: results are for the last valid sketch.';
    tone = 'warn';
  } else if (vf.status === 'error') {
    text = 'View factors failed: results are for an earlier sketch.';
    tone = 'error';
  } else {
    text = 'Recomputing… (results are one step behind)';
    tone = 'busy';
  }
  return (
    <p
      className={`result-status ${tone}`}
      role="status"
      aria-live="polite"
      data-exchange-status={ex.kind === 'none' ? 'none' : ex.stale ? 'stale' : ex.kind}
    >
      <span className="dot" aria-hidden="true" />
      {text}
    </p>
  );
}
