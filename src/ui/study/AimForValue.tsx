// "Aim for a value": the value of the chosen parameter, within the range, at
// which one surface's result equals a number (scan, then Brent's method).
import { useId, useState } from 'react';
import { QUANTITIES, QUANTITY_UNIT, useStudyField, type Quantity } from '../../state/study';
import type { CheckedSketch } from '../../state/documentApi';
import { useStudyRun } from './useStudyRun';

const QUANTITY_WORDS: Record<Quantity, string> = {
  netHeat: 'net heat',
  netFlux: 'net flux',
  temperature: 'temperature',
  radiosity: 'radiosity',
  peakToAverage: 'peak-to-average net flux',
};

/** Results a surface of the list can aim at (a profile's peak-to-average names a split tube or wall: command line). */
const SURFACE_QUANTITIES = QUANTITIES.filter((q) => q !== 'peakToAverage');

interface Props {
  sketch: CheckedSketch;
  doc: unknown;
  names: string[];
  address: string;
  range: { from: number; to: number } | null;
}

export function AimForValue({ sketch, doc, names, address, range }: Props) {
  const id = useId();
  const [surface, setSurface] = useStudyField('aim surface', names[0] ?? '');
  const [quantityText, setQuantity] = useStudyField('aim quantity', 'netHeat');
  const quantity: Quantity = SURFACE_QUANTITIES.find((q) => q === quantityText) ?? 'netHeat';
  const [target, setTarget] = useStudyField('aim value', '');
  const [problem, setProblem] = useState<string | null>(null);
  const run = useStudyRun('aim');
  const chosen = names.includes(surface) ? surface : (names[0] ?? '');

  const find = () => {
    const value = target.trim() === '' ? Number.NaN : Number(target);
    if (!Number.isFinite(value)) return setProblem('Type the value to aim for as a number.');
    if (!range) return setProblem('Give the range above first.');
    setProblem(null);
    run.start(
      {
        kind: 'solve',
        sketch,
        address,
        from: range.from,
        to: range.to,
        steps: 16,
        surface: chosen,
        quantity,
        target: value,
      },
      doc,
    );
  };
  const reply = run.final?.reply;
  return (
    <section aria-labelledby={`${id}-h`} className="study-aim">
      <h3 id={`${id}-h`}>Aim for a value</h3>
      <p className="hint">The value in the range above at which a result of one surface equals your number.</p>
      <div className="study-row">
        <label>
          Surface{' '}
          <select value={chosen} onChange={(e) => setSurface(e.target.value)}>
            {names.map((n) => (
              <option key={n} value={n}>
                {n}
              </option>
            ))}
          </select>
        </label>
        <label>
          Result{' '}
          <select value={quantity} onChange={(e) => setQuantity(e.target.value)}>
            {SURFACE_QUANTITIES.map((q) => (
              <option key={q} value={q}>
                {QUANTITY_WORDS[q]} ({QUANTITY_UNIT[q]})
              </option>
            ))}
          </select>
        </label>
        <label>
          equals{' '}
          <input value={target} onChange={(e) => setTarget(e.target.value)} size={10} aria-label="Value to aim for" />
        </label>
        <button type="button" onClick={find} disabled={run.busy}>
          Find
        </button>
        {run.busy && (
          <button type="button" onClick={run.stop}>
            Stop
          </button>
        )}
      </div>
      {problem && <p className="study-problem">{problem}</p>}
      {reply?.kind === 'failed' && <p className="study-problem">{reply.message}</p>}
      {reply?.kind === 'solve' && (
        <p role="status" aria-label="Value found">
          {reply.answer.summary}.
          {reply.answer.values.length > 1 &&
            ` Met ${reply.answer.values.length} times in the range: ${reply.answer.values.map((v) => Number(v.toPrecision(10))).join(', ')}; the lowest is shown.`}
          {run.final?.doc !== doc && ' (For the sketch as it was; it has changed since.)'}
        </p>
      )}
    </section>
  );
}
