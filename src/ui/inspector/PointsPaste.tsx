import { useId, useState } from 'react';
import { useAppStore } from '../AppContext';
import { readPointColumns, setShapePoints } from '../../state/edits/pointTable';

/** A box to paste a shape's points as two columns (x, y) copied from a spreadsheet. */
export function PointsPaste({ shape }: { shape: number }) {
  const store = useAppStore();
  const id = useId();
  const [problem, setProblem] = useState<string | null>(null);
  const [text, setText] = useState('');
  const apply = (pasted: string) => {
    const r = readPointColumns(pasted);
    if ('problem' in r) {
      setProblem(r.problem);
      return;
    }
    setProblem(null);
    setText('');
    store.getState().edit((d) => setShapePoints(d, shape, r.points));
  };
  return (
    <div className="points-paste">
      <label htmlFor={id}>Paste points (x and y columns from a spreadsheet)</label>
      <textarea
        id={id}
        rows={2}
        value={text}
        placeholder={'x\ty\n0\t0'}
        aria-invalid={problem ? true : undefined}
        onChange={(e) => setText(e.target.value)}
        onPaste={(e) => {
          e.preventDefault();
          apply(e.clipboardData.getData('text'));
        }}
        onKeyDown={(e) => {
          if (e.key === 'Enter' && (e.ctrlKey || e.metaKey)) apply(text);
        }}
      />
      {problem && (
        <span className="field-problem" role="alert">
          not applied: {problem}
        </span>
      )}
    </div>
  );
}
