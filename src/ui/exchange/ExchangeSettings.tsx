import { useId } from 'react';
import { useApp, useAppStore } from '../AppContext';
import { selectSettings, selectTemperatureUnit } from '../../state/exchange/selectors';
import { setSettings } from '../../state/exchange/edits';
import { fromKelvin, temperatureProblem, TEMPERATURE_LABEL, toKelvin, valueProblem } from '../../state/exchange/units';
import { CheckedField } from './CheckedField';

/** The sketch's settings for heat exchange: surroundings and gas temperatures, and depth. */
export function ExchangeSettings() {
  const id = useId();
  const settings = useApp(selectSettings);
  const unit = useApp(selectTemperatureUnit);
  const store = useAppStore();
  const Ts = settings?.surroundingsTemperature;
  const Tg = settings?.gasTemperature;
  return (
    <section className="exchange-settings" aria-labelledby={`${id}-title`}>
      <h3 id={`${id}-title`}>Sketch settings</h3>
      <div className="row">
        <CheckedField
          label={`surroundings temperature (${TEMPERATURE_LABEL[unit]})`}
          value={Ts === undefined ? undefined : fromKelvin(Ts, unit)}
          placeholder="not set"
          optional
          title="Temperature of the surroundings seen through openings and around an open sketch (black); kept in kelvin in the file"
          check={(v) => temperatureProblem(v, unit)}
          onCommit={(v) =>
            store
              .getState()
              .edit((d) => setSettings(d, { surroundingsTemperature: v === undefined ? undefined : toKelvin(v, unit) }))
          }
        />
        <CheckedField
          label={`gas temperature (${TEMPERATURE_LABEL[unit]})`}
          value={Tg === undefined ? undefined : fromKelvin(Tg, unit)}
          placeholder="not set"
          optional
          title="Temperature of the gas in the section, for surfaces with a convection coefficient; the gas is transparent (no gas radiation); kept in kelvin in the file"
          check={(v) => temperatureProblem(v, unit)}
          onCommit={(v) =>
            store
              .getState()
              .edit((d) => setSettings(d, { gasTemperature: v === undefined ? undefined : toKelvin(v, unit) }))
          }
        />
        <CheckedField
          label="depth (m)"
          value={settings?.depth}
          placeholder="not set"
          optional
          title="Length of the long dimension (duct or furnace length), metres: turns W per metre into W"
          check={(v) => valueProblem('depth', v)}
          onCommit={(v) => store.getState().edit((d) => setSettings(d, { depth: v }))}
        />
      </div>
    </section>
  );
}
