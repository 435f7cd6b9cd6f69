import { useId, useState } from 'react';

/** A labelled text input that commits on Enter or leaving the field. */
export function TextField({
  label,
  title,
  value,
  onCommit,
  placeholder,
  hideLabel,
  check,
}: {
  label: string;
  title: string;
  value: string;
  onCommit: (v: string) => void;
  placeholder?: string;
  hideLabel?: boolean;
  /** Why a typed text cannot be used, or null; a refused text is not committed and the reason is shown. */
  check?: (v: string) => string | null;
}) {
  const id = useId();
  // What the user is typing, or null when not editing: then the field shows `value` as it is now.
  const [draft, setDraft] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const text = draft ?? value;
  const commit = () => {
    const typed = text.trim();
    const why = typed && typed !== value ? (check?.(typed) ?? null) : null;
    setProblem(why);
    if (!why && typed && text !== value) onCommit(typed);
    setDraft(null);
  };
  return (
    <span className="field" title={title}>
      <label htmlFor={id} className={hideLabel ? 'sr-only' : undefined}>
        {label}
      </label>
      <input
        id={id}
        type="text"
        value={text}
        placeholder={placeholder}
        maxLength={200}
        aria-invalid={problem ? true : undefined}
        onChange={(e) => setDraft(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit();
          if (e.key === 'Escape') setDraft(null);
        }}
      />
      {problem && <span className="field-problem">not applied: {problem}</span>}
    </span>
  );
}
