import { useEffect, useId, useState } from 'react';

/** A labelled text input that commits on Enter or leaving the field. */
export function TextField({ label, title, value, onCommit, placeholder, hideLabel }: {
  label: string; title: string; value: string; onCommit: (v: string) => void; placeholder?: string; hideLabel?: boolean;
}) {
  const id = useId();
  const [text, setText] = useState(value);
  useEffect(() => setText(value), [value]);
  const commit = () => { if (text.trim() && text !== value) onCommit(text.trim()); else setText(value); };
  return (
    <span className="field" title={title}>
      <label htmlFor={id} className={hideLabel ? 'sr-only' : undefined}>{label}</label>
      <input id={id} type="text" value={text} placeholder={placeholder} maxLength={200}
        onChange={(e) => setText(e.target.value)} onBlur={commit}
        onKeyDown={(e) => { if (e.key === 'Enter') commit(); if (e.key === 'Escape') setText(value); }} />
    </span>
  );
}
