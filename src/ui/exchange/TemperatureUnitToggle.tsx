import { useApp, useAppStore } from '../AppContext';
import { selectTemperatureUnit } from '../../state/exchange/selectors';
import type { TemperatureUnit } from '../../state/exchange/slice';
import { TEMPERATURE_LABEL } from '../../state/exchange/units';

/** K or degrees Celsius for every temperature the panel shows or accepts (the file keeps kelvin). */
export function TemperatureUnitToggle() {
  const unit = useApp(selectTemperatureUnit);
  const store = useAppStore();
  return (
    <div className="segmented" role="radiogroup" aria-label="Temperature unit">
      {(['K', 'C'] as TemperatureUnit[]).map((u) => (
        <label
          key={u}
          title={
            u === 'K'
              ? 'Show and type temperatures in kelvin'
              : 'Show and type temperatures in degrees Celsius (the file keeps kelvin)'
          }
        >
          <input
            type="radio"
            name="temperature-unit"
            checked={unit === u}
            onChange={() => store.getState().setTemperatureUnit(u)}
          />
          {TEMPERATURE_LABEL[u]}
        </label>
      ))}
    </div>
  );
}
