import { useId, useState } from 'react';
import { useApp } from '../AppContext';
import { selectDoc } from '../../state/selectors';
import type { ExchangeSolved } from '../../state/exchange/slice';
import { exchangeProfile, facingAngle, profileChoices, profileCsvText } from '../../state/exchange/profile';
import { downloadText } from '../chrome/download';
import { fmtHeat, fmtTemperature } from './format';
import { selectTemperatureUnit } from '../../state/exchange/selectors';
import { TEMPERATURE_LABEL } from '../../state/exchange/units';
import { ProfilePlot } from './ProfilePlot';

/**
 * The local net flux around a tube split into arcs, or along a wall split into
 * parts: plot, peak, mean, peak-to-average ratio and a CSV download.
 */
export function ProfilePanel({ ex }: { ex: ExchangeSolved }) {
  const id = useId();
  const doc = useApp(selectDoc);
  const unit = useApp(selectTemperatureUnit);
  const choices = profileChoices(doc.shapes);
  const [wanted, setWanted] = useState<string | null>(null);
  const [towards, setTowards] = useState('');
  const name = wanted !== null && choices.includes(wanted) ? wanted : choices[0];
  if (name === undefined)
    return (
      <section className="flux-profile" aria-label="Flux profile">
        <h4>Flux profile</h4>
        <p className="hint">
          To see how the flux varies around a tube or along a wall, choose it in the Surfaces tab and split it into
          parts (a tube into equal arcs).
        </p>
      </section>
    );
  const p = exchangeProfile(ex, doc.shapes, name);
  const facing =
    !('problem' in p) && p.along === 'angle' && towards && !p.rows.some((r) => r.surface === towards)
      ? facingAngle(doc.shapes, p.shape, towards)
      : null;
  /** The peak's angle from the side facing the chosen surface, -180° to 180°, anticlockwise positive. */
  const fromFacing = (a: number) => (facing === null ? 0 : ((((a - facing + 180) % 360) + 360) % 360) - 180);
  return (
    <section className="flux-profile" aria-label="Flux profile">
      <h4>Flux profile</h4>
      <label htmlFor={`${id}-name`}>surface </label>
      <select id={`${id}-name`} value={name} onChange={(e) => setWanted(e.target.value)}>
        {choices.map((c) => (
          <option key={c} value={c}>
            {c}
          </option>
        ))}
      </select>
      {'problem' in p ? (
        <p className="hint">No profile: {p.problem}.</p>
      ) : (
        <>
          {p.along === 'angle' && (
            <span className="field">
              <label htmlFor={`${id}-towards`}>mark the side facing </label>
              <select id={`${id}-towards`} value={towards} onChange={(e) => setTowards(e.target.value)}>
                <option value="">(none)</option>
                {ex.names
                  .filter((n) => !p.rows.some((r) => r.surface === n))
                  .map((n) => (
                    <option key={n} value={n}>
                      {n}
                    </option>
                  ))}
              </select>
            </span>
          )}
          <ProfilePlot p={p} units={ex.units} facing={facing === null ? null : { angle: facing, name: towards }} />
          <p className="profile-stats">
            peak <strong>{fmtHeat(p.peak)} W/m²</strong> at{' '}
            {p.along === 'angle' ? `${fmtHeat(p.peakAt)}°` : `${fmtHeat(p.peakAt)} ${ex.units}`}
            {facing !== null && ` (${fmtHeat(fromFacing(p.peakAt))}° from the side facing ${towards})`}; average{' '}
            <strong>{fmtHeat(p.average)} W/m²</strong>; peak-to-average{' '}
            <strong>{p.peakToAverage === null ? '— (the flux changes sign)' : fmtHeat(p.peakToAverage)}</strong>
            {p.peakTemperature !== undefined && p.peakTemperatureAt !== undefined && (
              <>
                ; {p.along === 'angle' ? 'hottest metal' : 'hottest part'}{' '}
                <strong>
                  {fmtTemperature(p.peakTemperature, unit)} {TEMPERATURE_LABEL[unit]}
                </strong>{' '}
                at{' '}
                {p.along === 'angle'
                  ? `${fmtHeat(p.peakTemperatureAt)}°`
                  : `${fmtHeat(p.peakTemperatureAt)} ${ex.units}`}
              </>
            )}
          </p>
          <p className="hint">
            Net flux &lt; 0: the surface takes heat up. Angles run anticlockwise from the +x side of the centre. Each
            point is the mean over one arc or part: split finer to resolve the peak.
          </p>
          <button
            type="button"
            title="Download angle (or position) against net flux as CSV (same as the command line's exchange --profile)"
            onClick={() => downloadText(`profile-${name}.csv`, profileCsvText(p, ex.units), 'text/csv')}
          >
            Download profile CSV
          </button>
        </>
      )}
    </section>
  );
}
