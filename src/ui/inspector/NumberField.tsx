import { useId, useState } from 'react';

interface Props {
  label: string;
  title: string;
  value: number;
  onCommit: (v: number) => void;
  width?: string;
  integer?: boolean;
  /** Digits shown when not editing. */
  precision?: number;
}

/** A labelled number input that commits on Enter or leaving the field, and refuses non-numbers. */
export function NumberField({ label, title, value, onCommit, width, integer, precision = 10 }: Props) {
  const id = useId();
  const shown = integer ? String(value) : String(Number(value.toPrecision(precision)));
  // What the user is typing, or null when not editing: then the field shows the stored value as it is now.
  const [draft, setDraft] = useState<string | null>(null);
  const text = draft ?? shown;
  const parsed = Number(text.trim().replace(',', '.'));
  const bad = text.trim() === '' || !Number.isFinite(parsed);
  const commit = () => {
    setDraft(null);
    if (bad) return;
    // Only what the user typed counts: leaving an untouched field must not round the stored value.
    if (text.trim() !== shown && parsed !== value) onCommit(integer ? Math.round(parsed) : parsed);
  };
  return (
    <span className="field" title={title}>
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        value={text}
        aria-invalid={bad || undefined}
        style={width ? { width } : undefined}
        onFocus={() => setDraft(text)}
        onChange={(e) => setDraft(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit();
          if (e.key === 'Escape') setDraft(null);
        }}
      />
    </span>
  );
}
