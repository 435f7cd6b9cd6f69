import { useId, useState } from 'react';

/** A labelled text input that commits on Enter or leaving the field. */
export function TextField({
  label,
  title,
  value,
  onCommit,
  placeholder,
  hideLabel,
}: {
  label: string;
  title: string;
  value: string;
  onCommit: (v: string) => void;
  placeholder?: string;
  hideLabel?: boolean;
}) {
  const id = useId();
  // What the user is typing, or null when not editing: then the field shows `value` as it is now.
  const [draft, setDraft] = useState<string | null>(null);
  const text = draft ?? value;
  const commit = () => {
    if (text.trim() && text !== value) onCommit(text.trim());
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
