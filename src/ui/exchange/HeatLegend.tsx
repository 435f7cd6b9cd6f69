import { useId } from 'react';
import { useApp, useAppStore } from '../AppContext';
import { selectExchange, selectHeatColouring } from '../../state/exchange/selectors';
import type { HeatColouring } from '../../state/exchange/slice';
import { SCALE_GRADIENT } from './heatScale';
import { fmtHeat } from './format';
import { useHeatScale } from './useHeatScale';
import './exchange.css';

const MODES: { mode: HeatColouring; label: string; title: string }[] = [
  { mode: 'off', label: 'off', title: 'Surface colours' },
  {
    mode: 'netFlux',
    label: 'net flux',
    title: 'Colour edges by net radiative flux (blue takes heat up, orange gives heat off)',
  },
  {
    mode: 'temperature',
    label: 'temperature',
    title: 'Colour edges by surface temperature (blue cooler, orange hotter)',
  },
  {
    mode: 'inside',
    label: 'cold face / tube inner',
    title:
      'Colour walls by their cold face (casing) and tubes by their inner wall temperature; other surfaces stay uncoloured',
  },
];

/** Over the canvas: the heat colouring toggle and, when on, its legend. */
export function HeatLegend() {
  const id = useId();
  const mode = useApp(selectHeatColouring);
  const ex = useApp(selectExchange);
  const store = useAppStore();
  const { scale, stale } = useHeatScale();
  return (
    <div className="heat-legend" role="group" aria-labelledby={`${id}-legend`}>
      <fieldset>
        <legend id={`${id}-legend`}>Heat colours</legend>
        {MODES.map((m) => (
          <label key={m.mode} title={m.title}>
            <input
              type="radio"
              name={`${id}-mode`}
              checked={mode === m.mode}
              onChange={() => store.getState().setHeatColouring(m.mode)}
            />
            {m.label}
          </label>
        ))}
      </fieldset>
      {scale && (
        <div aria-label="Colour legend">
          <div className="scale-title">{scale.title}</div>
          <div className="bar" style={{ background: SCALE_GRADIENT }} aria-hidden="true" />
          <div className="ticks">
            <span>{fmtHeat(scale.low)}</span>
            <span>{fmtHeat(scale.centre)}</span>
            <span>{fmtHeat(scale.high)}</span>
          </div>
          {stale && <p className="hint">one step behind the sketch</p>}
        </div>
      )}
      {mode !== 'off' && !scale && (
        <p className="hint">
          {ex.kind === 'error' ? 'No heat results: see the Heat exchange tab.' : 'No heat results yet.'}
        </p>
      )}
    </div>
  );
}
