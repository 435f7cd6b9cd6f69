import { useEffect, useState } from 'react';
import { RESULTS_CAUTION } from '../../state/exchange/labels';

/** The caution that goes with every result (worded once in src/document/exchange/cautions.ts). */
export const SAFETY_TEXT = RESULTS_CAUTION;

/** The results panel's own caution (src/ui/exchange): while it is on the page the footer points to it instead. */
const RESULTS_CAUTION_NOTE = '[role="note"][aria-label="Caution about these results"]';

/** True while another caution is on the page, so the caution is said once. */
function useCautionElsewhere(): boolean {
  const [elsewhere, setElsewhere] = useState(false);
  useEffect(() => {
    const check = () => setElsewhere(document.querySelector(RESULTS_CAUTION_NOTE) !== null);
    check();
    const watch = new MutationObserver(check);
    watch.observe(document.body, { childList: true, subtree: true });
    return () => watch.disconnect();
  }, []);
  return elsewhere;
}

/** The caution, one line at the foot of the page; the same height either way, so the drawing never moves. */
export function SafetyNote() {
  const elsewhere = useCautionElsewhere();
  return (
    <footer className="safety" role="note" aria-label="Safety caution">
      <strong>Caution:</strong>{' '}
      {elsewhere ? 'see the caution beside the net heat table; it applies to every result.' : SAFETY_TEXT}
    </footer>
  );
}
