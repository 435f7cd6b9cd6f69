import { useId } from 'react';
import { useApp, useAppStore } from '../AppContext';
import { selectDoc } from '../../state/selectors';
import { selectExchange, selectTemperatureUnit } from '../../state/exchange/selectors';
import {
  conditionIn,
  DEFAULT_CONDITION,
  DEFAULT_EMISSIVITY,
  linkChoices,
  setCondition,
  setConvection,
  setEmissivity,
  setSurfaceProps,
  surfacePropsOf,
  type ConditionChoice,
} from '../../state/exchange/edits';
import { fromKelvin, temperatureProblem, TEMPERATURE_LABEL, toKelvin, valueProblem } from '../../state/exchange/units';
import type { SurfaceProps } from '../../state/sketchFile';
import type { AppState } from '../../state/store';
import { CheckedField } from './CheckedField';
import { LinkedEditor, TubeEditor, WallEditor } from './ConditionEditors';
import { useSurfaceChoice } from './useSurfaceChoice';
import { TemperatureUnitToggle } from './TemperatureUnitToggle';

type Kind = ConditionChoice['kind'];

const KIND_LABEL: Record<Kind, string> = {
  temperature: 'temperature',
  heatFlux: 'heat flux',
  adiabatic: 'adiabatic (reradiating)',
  opening: 'opening to the surroundings',
  wall: 'lined wall to outside air',
  tube: 'tube with a fluid inside',
  linked: 'thin plate (linked face)',
};

const KIND_TITLE: Record<Kind, string> = {
  temperature: 'The surface is held at a temperature; the heat supplied from behind is solved',
  heatFlux: 'Heat is supplied from behind (> 0: into the surface, leaving its front); its temperature is solved',
  adiabatic: 'Insulated: nothing passes through the back; its temperature is solved',
  opening: 'A gap to the outside: black, at the surroundings temperature',
  wall: 'A plane lining of layers to the outside air; hot-face, interface and casing temperatures are solved',
  tube: 'A tube carrying a fluid; the outer metal temperature and the heat the fluid takes up are solved',
  linked: 'One face of a thin plate (a baffle, a shield): one temperature for both faces',
};

/** Temperature a surface starts at when it is first given one, K (room temperature, common practice). */
const ROOM_TEMPERATURE = 293.15;

/** Starting values of a new wall: one 0.2 m layer of a dense refractory (about 1 W/(m·K)), still air outside (10 W/(m²·K)); edit them. */
const START_LAYER = { thickness: 0.2, conductivity: 1 };
const START_OUTSIDE_COEFFICIENT = 10;
/** Starting values of a new tube: a 4-inch schedule 40 steel pipe (114.3 mm by 6.02 mm wall, about 45 W/(m·K)) and a liquid film of 1000 W/(m²·K); edit them. */
const START_TUBE = { insideCoefficient: 1000, outerDiameter: 0.1143, innerDiameter: 0.10226, wallConductivity: 45 };

/** The condition the file gives a surface, or the default (kinds from the one rule in document/exchange/conditions.ts). */
function kindOf(props: SurfaceProps | undefined): { kind: Kind; isDefault: boolean } {
  const condition = conditionIn(props);
  return condition ? { kind: condition.kind, isDefault: false } : { kind: DEFAULT_CONDITION.kind, isDefault: true };
}

const selectSurroundings = (s: AppState) => s.doc.settings?.surroundingsTemperature;
const selectGas = (s: AppState) => s.doc.settings?.gasTemperature;

/** Emissivity and the one condition of the surface chosen on the canvas or in the list. */
export function SurfaceProperties() {
  const id = useId();
  const doc = useApp(selectDoc);
  const unit = useApp(selectTemperatureUnit);
  const exchange = useApp(selectExchange);
  const surroundings = useApp(selectSurroundings);
  const gas = useApp(selectGas);
  const store = useAppStore();
  const { names, current, choose } = useSurfaceChoice();
  if (current === null) return <p className="hint">No surfaces yet: draw an enclosure or a body first.</p>;

  const props = surfacePropsOf(doc, current);
  const { kind, isDefault } = kindOf(props);
  const edit = (fn: (d: typeof doc) => typeof doc) => store.getState().edit(fn);
  const solvedIndex = exchange.kind === 'solved' ? exchange.names.indexOf(current) : -1;

  // A new condition starts from the surface's current result, so switching keeps the answer where it is.
  const startValue = (k: Kind): ConditionChoice => {
    if (k === 'temperature') {
      const T =
        solvedIndex >= 0 && exchange.kind === 'solved'
          ? exchange.result.temperature[solvedIndex]
          : (surroundings ?? ROOM_TEMPERATURE);
      return { kind: k, temperature: Number(T.toFixed(2)) };
    }
    if (k === 'heatFlux') {
      const q = solvedIndex >= 0 && exchange.kind === 'solved' ? exchange.result.netFlux[solvedIndex] : 0;
      return { kind: k, heatFlux: Number(q.toPrecision(6)) };
    }
    const outside = surroundings ?? ROOM_TEMPERATURE;
    if (k === 'wall') {
      return {
        kind: k,
        layers: [{ ...START_LAYER }],
        outsideTemperature: outside,
        outsideCoefficient: START_OUTSIDE_COEFFICIENT,
      };
    }
    if (k === 'tube') return { kind: k, fluidTemperature: outside, ...START_TUBE };
    if (k === 'linked') return { kind: k, surface: linkChoices(doc, current)[0] ?? '' };
    return { kind: k };
  };
  const condition = conditionIn(props);
  const setTo = (next: ConditionChoice) => edit((d) => setCondition(d, current, next));
  const choices = linkChoices(doc, current);

  return (
    <section key={current} className="exchange-props" aria-labelledby={`${id}-title`}>
      <div className="exchange-head">
        <h3 id={`${id}-title`}>Surface properties</h3>
        <TemperatureUnitToggle />
      </div>
      <div className="row">
        <label htmlFor={`${id}-surface`}>surface</label>
        <select
          id={`${id}-surface`}
          value={current}
          title="Surface to edit (selecting an edge on the canvas picks its surface)"
          onChange={(e) => choose(e.target.value)}
        >
          {names.map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </select>
        <button
          type="button"
          disabled={!props}
          title="Remove this surface's properties from the file, so the defaults apply"
          onClick={() => edit((d) => setSurfaceProps(d, current, undefined))}
        >
          Use defaults
        </button>
      </div>
      {!props && (
        <p className="hint">
          No properties in the file: the defaults apply (emissivity {DEFAULT_EMISSIVITY}, adiabatic).
        </p>
      )}
      <div className="row">
        <CheckedField
          label="emissivity"
          value={kind === 'opening' ? 1 : props?.emissivity}
          placeholder={`${DEFAULT_EMISSIVITY} (default)`}
          optional
          disabled={kind === 'opening'}
          title="Hemispherical emissivity, in (0, 1]; leave empty for the default"
          check={(v) => valueProblem('emissivity', v)}
          onCommit={(v) => edit((d) => setEmissivity(d, current, v))}
        />
        <label htmlFor={`${id}-condition`}>condition</label>
        <select
          id={`${id}-condition`}
          value={kind}
          title={KIND_TITLE[kind]}
          onChange={(e) => edit((d) => setCondition(d, current, startValue(e.target.value as Kind)))}
        >
          {(Object.keys(KIND_LABEL) as Kind[]).map((k) => (
            <option key={k} value={k} title={KIND_TITLE[k]} disabled={k === 'linked' && choices.length === 0}>
              {KIND_LABEL[k]}
              {isDefault && k === 'adiabatic' ? ' (default)' : ''}
            </option>
          ))}
        </select>
      </div>
      <div className="row">
        {kind === 'temperature' && props?.temperature !== undefined && (
          <CheckedField
            label={`temperature (${TEMPERATURE_LABEL[unit]})`}
            value={fromKelvin(props.temperature, unit)}
            title="Temperature held at the surface; kept in kelvin in the file"
            check={(v) => temperatureProblem(v, unit)}
            onCommit={(v) =>
              v !== undefined &&
              edit((d) => setCondition(d, current, { kind: 'temperature', temperature: toKelvin(v, unit) }))
            }
          />
        )}
        {kind === 'heatFlux' && props?.heatFlux !== undefined && (
          <>
            <CheckedField
              label="heat flux (W/m²)"
              value={props.heatFlux}
              title="Net radiative flux imposed on the surface, W/m²; > 0 when heat leaves the surface"
              check={(v) => valueProblem('heatFlux', v)}
              onCommit={(v) =>
                v !== undefined && edit((d) => setCondition(d, current, { kind: 'heatFlux', heatFlux: v }))
              }
            />
            <span className="hint">&gt; 0: heat leaves the surface; temperature solved</span>
          </>
        )}
        {kind === 'adiabatic' && (
          <span className="hint">
            Nothing passes through the back; temperature solved. Without convection its net radiation is zero and its
            emissivity has no effect on the rest.
          </span>
        )}
        {kind === 'opening' && (
          <span className="hint">
            Black, at the surroundings temperature{surroundings === undefined ? ' — set one below' : ''}.
          </span>
        )}
      </div>
      {condition?.kind === 'wall' && <WallEditor condition={condition} unit={unit} onChange={setTo} />}
      {condition?.kind === 'tube' && <TubeEditor condition={condition} unit={unit} onChange={setTo} />}
      {condition?.kind === 'linked' && (
        <LinkedEditor id={id} current={current} other={condition.surface} choices={choices} onChange={setTo} />
      )}
      {kind !== 'opening' && (
        <div className="row">
          <CheckedField
            label="convection coefficient (W/(m²·K))"
            value={props?.convectionCoefficient}
            placeholder="none"
            optional
            title="Film coefficient between this surface's front and the gas; empty: no convection"
            check={(v) => valueProblem('convectionCoefficient', v)}
            onCommit={(v) => edit((d) => setConvection(d, current, v))}
          />
          {props?.convectionCoefficient !== undefined && props.convectionCoefficient > 0 && gas === undefined && (
            <span className="hint">Set a gas temperature below.</span>
          )}
        </div>
      )}
    </section>
  );
}
