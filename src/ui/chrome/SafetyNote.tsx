export const SAFETY_TEXT =
  'Gray-diffuse radiation only: no convection, and no absorbing gas unless modelled. ' +
  'Results support, and do not replace, local codes and licensed engineering practice.';

export function SafetyNote() {
  return (
    <footer className="safety" role="note" aria-label="Safety caution">
      <strong>Caution:</strong> {SAFETY_TEXT}
    </footer>
  );
}
