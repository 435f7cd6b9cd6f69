// "Which input matters": how much each surface's net heat changes per unit of
// each emissivity and per kelvin of each fixed temperature, signed, with units.
import { useId } from 'react';
import type { CheckedSketch } from '../../state/documentApi';
import { useStudyRun } from './useStudyRun';

const cell = (v: number) => (v === 0 ? '0' : String(Number(v.toPrecision(4))));

export function InputEffects({ sketch, doc }: { sketch: CheckedSketch; doc: unknown }) {
  const id = useId();
  const run = useStudyRun('effects');
  const reply = run.final?.reply;
  return (
    <section aria-labelledby={`${id}-h`}>
      <h3 id={`${id}-h`}>Which input matters</h3>
      <p className="hint">
        Change of each surface&apos;s net heat per unit change of each emissivity (W/m) and per kelvin of each fixed
        temperature (W/(m K)), from the derivative of the solution. Positive: the surface gives off more.
      </p>
      <div className="study-row">
        <button type="button" onClick={() => run.start({ kind: 'effects', sketch }, doc)} disabled={run.busy}>
          Work it out
        </button>
      </div>
      {reply?.kind === 'failed' && <p className="study-problem">{reply.message}</p>}
      {reply?.kind === 'effects' && (
        <div className="study-table-wrap">
          {run.final?.doc !== doc && <p className="hint">For the sketch as it was; it has changed since.</p>}
          <table className="study-table" aria-label="Change of net heat per input">
            <thead>
              <tr>
                <th scope="col">input</th>
                <th scope="col">unit</th>
                {reply.table.names.map((n) => (
                  <th scope="col" key={n}>
                    {n}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {reply.table.rows.map((r) => (
                <tr key={r.parameter}>
                  <th scope="row">{r.parameter}</th>
                  <td>{r.unit}</td>
                  {r.netHeat.map((d, i) => (
                    <td key={reply.table.names[i]}>{cell(d)}</td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
