import { useId, useState } from 'react';
import { readNumber, type NumberRule } from '../../state/edits/numberInput';

interface Props {
  label: string;
  title: string;
  value: number;
  onCommit: (v: number) => void;
  width?: string;
  integer?: boolean;
  /** Allowed range; a value outside is refused with a message, never clamped. */
  rule?: NumberRule;
  /** Digits shown when not editing. */
  precision?: number;
}

/**
 * A labelled number input that commits on Enter or leaving the field. Letters,
 * non-finite and out-of-range values are refused: the reason shows beside the
 * field and the old value stays.
 */
export function NumberField({ label, title, value, onCommit, width, integer, rule, precision = 10 }: Props) {
  const id = useId();
  const shown = integer ? String(value) : String(Number(value.toPrecision(precision)));
  // What the user is typing, or null when not editing: then the field shows the stored value as it is now.
  const [draft, setDraft] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const text = draft ?? shown;
  const commit = () => {
    setDraft(null);
    // Only what the user typed counts: leaving an untouched field must not round the stored value.
    if (text.trim() === shown) {
      setProblem(null);
      return;
    }
    const r = readNumber(text, { ...rule, integer: integer ?? rule?.integer });
    if (!r.ok) {
      setProblem(r.problem);
      return;
    }
    setProblem(null);
    if (r.value !== value) onCommit(r.value);
  };
  return (
    <span className="field" title={title}>
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        value={text}
        aria-invalid={problem ? true : undefined}
        aria-describedby={problem ? `${id}-problem` : undefined}
        style={width ? { width } : undefined}
        onFocus={() => setDraft(text)}
        onChange={(e) => setDraft(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit();
          if (e.key === 'Escape') {
            setDraft(null);
            setProblem(null);
          }
        }}
      />
      {problem && (
        <span id={`${id}-problem`} className="field-problem" role="alert">
          not applied: {label} {problem}
        </span>
      )}
    </span>
  );
}
