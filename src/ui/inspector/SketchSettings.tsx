import { useState } from 'react';
import { useApp, useAppStore } from '../AppContext';
import { selectUnits } from '../../state/selectors';
import { UNITS, type Units } from '../../state/sketchFile';
import { changeUnits, unitFactor, type UnitChange } from '../../state/edits/unitEdits';

export function SketchSettings() {
  const units = useApp(selectUnits);
  const store = useAppStore();
  const [target, setTarget] = useState<Units>(units);
  const [how, setHow] = useState<UnitChange>('convert');
  const apply = () => {
    store.getState().edit((d) => changeUnits(d, target, how));
    if (how === 'convert')
      store.getState().setGridStep(Number((store.getState().gridStep * unitFactor(units, target)).toPrecision(6)));
    store.getState().requestFit();
  };
  return (
    <div className="sketch-settings">
      <p>
        Units: <strong>{units}</strong>. Lengths in the table and the CSV are in these units; view factors have none.
      </p>
      <div className="row">
        <label htmlFor="unit-target">new units</label>
        <select
          id="unit-target"
          value={target}
          title="Units to change to"
          onChange={(e) => setTarget(e.target.value as Units)}
        >
          {UNITS.map((u) => (
            <option key={u} value={u}>
              {u}
            </option>
          ))}
        </select>
      </div>
      <fieldset>
        <legend>Coordinates</legend>
        <label title="Scale the numbers so the sketch keeps its real size">
          <input type="radio" name="unit-how" checked={how === 'convert'} onChange={() => setHow('convert')} /> convert
          (keep the real size)
        </label>
        <label title="Keep the numbers and only change the unit name">
          <input type="radio" name="unit-how" checked={how === 'relabel'} onChange={() => setHow('relabel')} /> relabel
          (keep the numbers)
        </label>
      </fieldset>
      <button
        type="button"
        disabled={target === units}
        title="Change the sketch's units (one undo step)"
        onClick={apply}
      >
        Change units
      </button>
    </div>
  );
}
