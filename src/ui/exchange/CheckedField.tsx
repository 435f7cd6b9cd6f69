import { useId, useState } from 'react';
import { fmtInput } from './format';

interface Props {
  label: string;
  title: string;
  /** Shown value in display units; undefined shows an empty field (with the placeholder). */
  value: number | undefined;
  placeholder?: string;
  /** An empty field commits undefined (clears the value). */
  optional?: boolean;
  /** Why a typed number cannot be used, or null. */
  check?: (v: number) => string | null;
  onCommit: (v: number | undefined) => void;
  disabled?: boolean;
}

/**
 * A labelled number input that commits on Enter or leaving the field. A value
 * that fails `check` is not applied and the reason is shown beside the field.
 * Only what the user typed commits, so an untouched field never rounds the file.
 */
export function CheckedField({ label, title, value, placeholder, optional, check, onCommit, disabled }: Props) {
  const id = useId();
  const shown = value === undefined ? '' : fmtInput(value);
  // What the user is typing, or null when not editing: then the field shows the stored value as it is now.
  const [draft, setDraft] = useState<string | null>(null);
  const text = draft ?? shown;
  const [problem, setProblem] = useState<string | null>(null);

  const problemOf = (t: string): string | null => {
    const trimmed = t.trim();
    if (trimmed === '') return optional ? null : 'enter a number';
    const v = Number(trimmed.replace(',', '.'));
    if (!Number.isFinite(v)) return 'must be a number';
    return check ? check(v) : null;
  };
  const commit = (leaving: boolean) => {
    const p = problemOf(text);
    setProblem(p);
    if (p) {
      // Leaving the field puts the stored value back; Enter keeps the text to fix.
      if (leaving) setDraft(null);
      return;
    }
    setDraft(null);
    if (text.trim() === shown) return;
    const trimmed = text.trim();
    const v = trimmed === '' ? undefined : Number(trimmed.replace(',', '.'));
    if (v !== value) onCommit(v);
  };
  return (
    <span className="field checked-field" title={title}>
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        value={text}
        placeholder={placeholder}
        disabled={disabled}
        aria-invalid={problem ? true : undefined}
        aria-describedby={problem ? `${id}-problem` : undefined}
        onFocus={() => setDraft(text)}
        onChange={(e) => {
          setProblem(null);
          setDraft(e.target.value);
        }}
        onBlur={() => commit(true)}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit(false);
          if (e.key === 'Escape') {
            setDraft(null);
            setProblem(null);
          }
        }}
      />
      {problem && (
        <span id={`${id}-problem`} className="field-problem">
          not applied: {label} {problem}
        </span>
      )}
    </span>
  );
}
