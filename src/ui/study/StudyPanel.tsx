// The "What if" tab: vary one input of the sketch over a range and see how the
// surfaces answer (a line plot, a table, a CSV download), or aim a result at a
// value. Runs the same studies as the command line's sweep and solve-for.
import { memo, useId, useMemo, useState } from 'react';
import { useApp, useDocumentApi } from '../AppContext';
import { selectDoc } from '../../state/selectors';
import { studyChoices, suggestedRange, useStudyField, type StudyChoice } from '../../state/study';
import { downloadText } from '../chrome/download';
import { AimForValue } from './AimForValue';
import { InputEffects } from './InputEffects';
import { StudyPlot } from './StudyPlot';
import { StudyTable } from './StudyTable';
import { useStudyRun } from './useStudyRun';
import './study.css';

const MAX_STEPS = 1000;

function readRange(fromText: string, toText: string, stepsText: string) {
  const [from, to, steps] = [fromText, toText, stepsText].map((t) => (t.trim() === '' ? Number.NaN : Number(t)));
  if (!Number.isFinite(from) || !Number.isFinite(to)) return { problem: 'Type both ends of the range as numbers.' };
  if (!Number.isInteger(steps) || steps < 2 || steps > MAX_STEPS)
    return { problem: `Steps: a whole number from 2 to ${MAX_STEPS}.` };
  return { from, to, steps };
}

export function StudyPanel() {
  const id = useId();
  const doc = useApp(selectDoc);
  const api = useDocumentApi();
  const read = useMemo(() => api.restore(doc), [api, doc]);
  const sketch = read.ok ? read.sketch : null;
  const choices = useMemo(() => (sketch ? studyChoices(sketch) : []), [sketch]);
  const names = useMemo(() => (sketch ? api.toScene(sketch).surfaceNames : []), [api, sketch]);
  const [address, setAddress] = useStudyField('address', '');
  const choice = choices.find((c) => c.address === address) ?? choices[0];
  // The range typed, for the parameter it was typed for ("address\nfrom\nto").
  const [rangeText, setRangeText] = useStudyField('range', '');
  const [stepsText, setStepsText] = useStudyField('steps', '11');
  const [result, setResult] = useState<'netHeat' | 'temperature'>('netHeat');
  const [hidden, setHidden] = useState<ReadonlySet<string>>(new Set());
  const run = useStudyRun('sweep');

  if (!sketch)
    return <p className="hint">The sketch has problems to fix first (see the canvas); then studies can run.</p>;
  if (!choice) return <p className="hint">Name some surfaces and give them properties to vary.</p>;

  // The range fields follow the chosen parameter until the user types in them.
  const suggested = suggestedRange(choice).map((v) => String(Number(v.toPrecision(6))));
  const typed = rangeText.split('\n');
  const fields =
    typed.length === 3 && typed[0] === choice.address
      ? { from: typed[1], to: typed[2] }
      : { from: suggested[0], to: suggested[1] };
  const setFields = (from: string, to: string) => setRangeText([choice.address, from, to].join('\n'));
  const range = readRange(fields.from, fields.to, stepsText);
  const reply = run.final?.reply;
  const table = reply?.kind === 'sweep' ? reply.table : null;
  const shown = table ? table.names.map((_, i) => i).filter((i) => !hidden.has(table.names[i])) : [];
  const unitText = choice.unit ? ` (${choice.unit})` : '';

  const go = () => {
    if ('problem' in range) return;
    run.start(
      { kind: 'sweep', sketch, address: choice.address, from: range.from, to: range.to, steps: range.steps },
      doc,
    );
  };
  const toggle = (name: string) =>
    setHidden((h) => {
      const next = new Set(h);
      if (next.has(name)) next.delete(name);
      else next.add(name);
      return next;
    });

  return (
    <div className="study-panel">
      <section aria-labelledby={`${id}-h`}>
        <h3 id={`${id}-h`}>What if</h3>
        <p className="hint">Vary one input over a range and see how every surface answers.</p>
        <div className="study-row">
          <label>
            Vary{' '}
            <select value={choice.address} onChange={(e) => setAddress(e.target.value)}>
              <ChoiceOptions choices={choices} />
            </select>
          </label>
        </div>
        <div className="study-row">
          <label>
            from{' '}
            <input
              value={fields.from}
              size={8}
              aria-label={`From${unitText}`}
              onChange={(e) => setFields(e.target.value, fields.to)}
            />
          </label>
          <label>
            to{' '}
            <input
              value={fields.to}
              size={8}
              aria-label={`To${unitText}`}
              onChange={(e) => setFields(fields.from, e.target.value)}
            />
          </label>
          <label>
            steps <input value={stepsText} size={4} aria-label="Steps" onChange={(e) => setStepsText(e.target.value)} />
          </label>
          <button type="button" onClick={go} disabled={run.busy || 'problem' in range}>
            Run
          </button>
          {run.busy && (
            <button type="button" onClick={run.stop}>
              Stop
            </button>
          )}
        </div>
        {'problem' in range && <p className="study-problem">{range.problem}</p>}
        {choice.geometry && (
          <p className="hint">
            Moving a shape or changing a tube row computes the view factors again for every value; it runs in the
            background.
          </p>
        )}
        {run.busy && (
          <progress aria-label="Study progress" max={run.progress?.total ?? 1} value={run.progress?.done ?? 0} />
        )}
        {reply?.kind === 'failed' && <p className="study-problem">{reply.message}</p>}
      </section>
      {table && (
        <section aria-label="Study results">
          {run.final?.doc !== doc && (
            <p className="hint">For the sketch as it was; it has changed since. Run again to update.</p>
          )}
          <div className="study-row">
            <label>
              Show{' '}
              <select value={result} onChange={(e) => setResult(e.target.value as 'netHeat' | 'temperature')}>
                <option value="netHeat">net heat (W/m)</option>
                <option value="temperature">temperature (K)</option>
              </select>
            </label>
            <button type="button" onClick={() => downloadText('study.csv', table.csv, 'text/csv')}>
              Download study CSV
            </button>
          </div>
          <fieldset className="study-surfaces">
            <legend>Surfaces</legend>
            {table.names.map((n) => (
              <label key={n}>
                <input type="checkbox" checked={!hidden.has(n)} onChange={() => toggle(n)} /> {n}
              </label>
            ))}
          </fieldset>
          <StudyPlot
            x={table.values}
            xLabel={table.unit ? `${table.label} (${table.unit})` : table.label}
            yLabel={result === 'netHeat' ? 'net heat, W per metre of depth' : 'temperature, K'}
            series={shown.map((i) => ({
              name: table.names[i],
              index: i,
              y: table.values.map((_, k) => (result === 'netHeat' ? table.netHeat : table.temperature)[k][i]),
            }))}
          />
          <StudyTable table={table} result={result} shown={shown} />
        </section>
      )}
      <AimForValue
        sketch={sketch}
        doc={doc}
        names={names}
        address={choice.address}
        range={'problem' in range ? null : range}
      />
      <InputEffects sketch={sketch} doc={doc} />
      <p className="hint">
        Net heat &gt; 0: the surface gives off more radiation than it takes up. Results support, not replace, local
        codes and licensed engineering practice.
      </p>
    </div>
  );
}

/** What an option shows of a choice: a property edit changes none of it. */
const sameOptions = (a: { choices: StudyChoice[] }, b: { choices: StudyChoice[] }): boolean =>
  a.choices.length === b.choices.length &&
  a.choices.every((c, k) => {
    const d = b.choices[k];
    return c.address === d.address && c.label === d.label && c.unit === d.unit;
  });

/** The list of what can be varied: drawn again only when the options change (a 1000-surface sketch has 4000). */
const ChoiceOptions = memo(function ChoiceOptions({ choices }: { choices: StudyChoice[] }) {
  return choices.map((c) => (
    <option key={c.address} value={c.address}>
      {c.label}
      {c.unit ? ` (${c.unit})` : ''}
    </option>
  ));
}, sameOptions);
