// The fields of the conditions that carry more than one number: a lined wall
// (a layer list), a tube, and a linked plate's other face. Lengths in metres
// and coefficients in SI, as the file keeps them; temperatures in the unit shown.
import type { ConditionChoice } from '../../state/exchange/edits';
import type { TemperatureUnit } from '../../state/exchange/slice';
import { fromKelvin, temperatureProblem, TEMPERATURE_LABEL, toKelvin, valueProblem } from '../../state/exchange/units';
import { CheckedField } from './CheckedField';

type Wall = Extract<ConditionChoice, { kind: 'wall' }>;
type Tube = Extract<ConditionChoice, { kind: 'tube' }>;

interface EditorProps<C> {
  condition: C;
  unit: TemperatureUnit;
  /** Replace the surface's condition (one undo step). */
  onChange: (next: C) => void;
}

/** A lined wall: layers from the hot face out, then the outside air. */
export function WallEditor({ condition: w, unit, onChange }: EditorProps<Wall>) {
  const setLayer = (k: number, patch: Partial<Wall['layers'][number]>) =>
    onChange({ ...w, layers: w.layers.map((l, i) => (i === k ? { ...l, ...patch } : l)) });
  return (
    <div className="condition-editor" role="group" aria-label="Wall">
      <ol className="layer-list" aria-label="Layers from the hot face outwards">
        {w.layers.map((l, k) => (
          <li key={k} className="row">
            <CheckedField
              label={`layer ${k + 1} thickness (m)`}
              value={l.thickness}
              title="Layer thickness in metres (whatever the sketch's units)"
              check={(v) => valueProblem('propertyLength', v)}
              onCommit={(v) => v !== undefined && setLayer(k, { thickness: v })}
            />
            <CheckedField
              label="conductivity (W/(m·K))"
              value={l.conductivity}
              title="Thermal conductivity, constant: take the value at the layer's mean temperature"
              check={(v) => valueProblem('conductivity', v)}
              onCommit={(v) => v !== undefined && setLayer(k, { conductivity: v })}
            />
            <button
              type="button"
              disabled={w.layers.length === 1}
              title="Remove this layer (a wall keeps at least one)"
              onClick={() => onChange({ ...w, layers: w.layers.filter((_, i) => i !== k) })}
            >
              Remove layer {k + 1}
            </button>
          </li>
        ))}
      </ol>
      <div className="row">
        <button
          type="button"
          title="Add a layer on the outside (cold side) of the lining"
          onClick={() => onChange({ ...w, layers: [...w.layers, { ...w.layers[w.layers.length - 1] }] })}
        >
          Add layer
        </button>
      </div>
      <div className="row">
        <CheckedField
          label={`outside temperature (${TEMPERATURE_LABEL[unit]})`}
          value={fromKelvin(w.outsideTemperature, unit)}
          title="Temperature of the air outside the casing; kept in kelvin in the file"
          check={(v) => temperatureProblem(v, unit)}
          onCommit={(v) => v !== undefined && onChange({ ...w, outsideTemperature: toKelvin(v, unit) })}
        />
        <CheckedField
          label="outside coefficient (W/(m²·K))"
          value={w.outsideCoefficient}
          title="Casing to outside air: convection and radiation combined (it must suit the casing temperature found), or convection alone when an outside emissivity is given"
          check={(v) => valueProblem('coefficient', v)}
          onCommit={(v) => v !== undefined && onChange({ ...w, outsideCoefficient: v })}
        />
        <CheckedField
          label="outside emissivity"
          value={w.outsideEmissivity}
          optional
          placeholder="in the coefficient"
          title="Casing emissivity to the outside; empty: casing radiation is part of the outside coefficient"
          check={(v) => valueProblem('emissivity', v)}
          onCommit={(v) => {
            const { outsideEmissivity: _old, ...rest } = w;
            onChange(v === undefined ? rest : { ...rest, outsideEmissivity: v });
          }}
        />
      </div>
    </div>
  );
}

/** A tube with a fluid inside: film and wall referred to the outer area. */
export function TubeEditor({ condition: t, unit, onChange }: EditorProps<Tube>) {
  return (
    <div className="condition-editor row" role="group" aria-label="Tube">
      <CheckedField
        label={`fluid temperature (${TEMPERATURE_LABEL[unit]})`}
        value={fromKelvin(t.fluidTemperature, unit)}
        title="Temperature of the fluid inside the tube; kept in kelvin in the file"
        check={(v) => temperatureProblem(v, unit)}
        onCommit={(v) => v !== undefined && onChange({ ...t, fluidTemperature: toKelvin(v, unit) })}
      />
      <CheckedField
        label="inside coefficient (W/(m²·K))"
        value={t.insideCoefficient}
        title="Film coefficient between the tube's inner wall and the fluid"
        check={(v) => valueProblem('coefficient', v)}
        onCommit={(v) => v !== undefined && onChange({ ...t, insideCoefficient: v })}
      />
      <CheckedField
        label="outer diameter (m)"
        value={t.outerDiameter}
        title="Outer diameter in metres (whatever the sketch's units); it enters only the tube's resistance"
        check={(v) =>
          valueProblem('propertyLength', v) ?? (v > t.innerDiameter ? null : 'must be above the inner diameter')
        }
        onCommit={(v) => v !== undefined && onChange({ ...t, outerDiameter: v })}
      />
      <CheckedField
        label="inner diameter (m)"
        value={t.innerDiameter}
        title="Inner diameter in metres, below the outer"
        check={(v) =>
          valueProblem('propertyLength', v) ?? (v < t.outerDiameter ? null : 'must be below the outer diameter')
        }
        onCommit={(v) => v !== undefined && onChange({ ...t, innerDiameter: v })}
      />
      <CheckedField
        label="wall conductivity (W/(m·K))"
        value={t.wallConductivity}
        title="Conductivity of the tube metal"
        check={(v) => valueProblem('conductivity', v)}
        onCommit={(v) => v !== undefined && onChange({ ...t, wallConductivity: v })}
      />
    </div>
  );
}

interface LinkedProps {
  id: string;
  current: string;
  other: string;
  /** Surfaces that can be the other face: no condition of their own, not already linked. */
  choices: string[];
  onChange: (next: ConditionChoice) => void;
}

/** A thin plate: this face and the chosen one share one temperature. */
export function LinkedEditor({ id, current, other, choices, onChange }: LinkedProps) {
  return (
    <div className="row">
      <label htmlFor={`${id}-linked`}>other face</label>
      <select
        id={`${id}-linked`}
        value={other}
        title="The other face of the same thin plate: it takes no condition of its own"
        onChange={(e) => onChange({ kind: 'linked', surface: e.target.value })}
      >
        {[...new Set([other, ...choices])]
          .filter((n) => n !== current)
          .map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
      </select>
      <span className="hint">One temperature for both faces; what one takes up the other gives off.</span>
    </div>
  );
}
