// Heat exchange in the app store (its edits): derived from the shown view factors and the
// document, live, never saved. The chain (exact view factors, dense solve) is
// exact to rounding, so closed forms are checked to 1e-9.
import { describe, expect, it } from 'vitest';
import { createAppStore } from '../../src/state/store';
import { documentApi } from '../../src/state/documentApi';
import {
  linkChoices,
  setCondition,
  setConvection,
  setEmissivity,
  setSettings,
  setSurfaceProps,
} from '../../src/state/exchange/edits';
import type { SketchFile } from '../../src/state/sketchFile';
import { renameSurface } from '../../src/state/edits/surfaceEdits';
import { edgeNames } from '../../src/state/geometry/polygon';
import { squares } from './exchangeHelpers';

describe('exchange edits', () => {
  it('one condition at a time, emissivity kept; back to the defaults removes the entry', () => {
    let doc = setCondition(squares, 'inner', { kind: 'heatFlux', heatFlux: 5000 });
    expect(doc.surfaces?.inner).toEqual({ emissivity: 0.6, heatFlux: 5000 });
    doc = setCondition(doc, 'inner', { kind: 'opening' });
    expect(doc.surfaces?.inner).toEqual({ emissivity: 0.6, opening: true });
    doc = setEmissivity(doc, 'inner', undefined);
    expect(doc.surfaces?.inner).toEqual({ opening: true });
    doc = setSurfaceProps(doc, 'inner', undefined);
    expect(Object.hasOwn(doc.surfaces!, 'inner')).toBe(false);
    doc = setSurfaceProps(doc, 'outer', undefined);
    expect('surfaces' in doc).toBe(false);
    expect(documentApi.restore(doc).ok).toBe(true);
  });

  it('an edit that changes nothing returns the same document, so it adds no undo step', () => {
    const store = createAppStore(squares);
    store.getState().edit((d) => setCondition(d, 'outer', { kind: 'temperature', temperature: 500 }));
    store.getState().edit((d) => setEmissivity(d, 'inner', 0.6));
    store.getState().edit((d) => setSettings(d, { depth: undefined }));
    expect(store.getState().doc).toBe(squares);
    expect(store.getState().past).toHaveLength(0);
  });

  it('names no edge uses are left alone; "__proto__" is a plain name', () => {
    expect(setEmissivity(squares, 'nowhere', 0.5)).toBe(squares);
    expect(setEmissivity(squares, '__proto__', 0.5)).toBe(squares);
    const named = renameSurface(squares, edgeNames(squares.shapes[0])[0], '__proto__');
    const set = setEmissivity(named, '__proto__', 0.5);
    expect(Object.getPrototypeOf(set.surfaces)).toBe(Object.prototype);
    expect(Object.keys(set.surfaces ?? {})).toContain('__proto__');
    expect(Object.getOwnPropertyDescriptor(set.surfaces, '__proto__')?.value).toMatchObject({ emissivity: 0.5 });
  });

  it('settings are set and cleared one at a time', () => {
    let doc = setSettings(squares, { surroundingsTemperature: 293.15, depth: 3 });
    expect(doc.settings).toEqual({ surroundingsTemperature: 293.15, depth: 3 });
    doc = setSettings(doc, { depth: undefined });
    expect(doc.settings).toEqual({ surroundingsTemperature: 293.15 });
    doc = setSettings(doc, { surroundingsTemperature: undefined });
    expect('settings' in doc).toBe(false);
  });
});

describe('surface balance edits', () => {
  const wall = {
    kind: 'wall' as const,
    layers: [{ thickness: 0.2, conductivity: 1 }],
    outsideTemperature: 300,
    outsideCoefficient: 10,
  };

  it('a wall, a tube and a link are conditions like the others: one at a time, emissivity and convection kept', () => {
    let doc = setConvection(squares, 'outer', 12);
    doc = setCondition(doc, 'outer', wall);
    expect(doc.surfaces?.outer).toEqual({
      emissivity: 0.8,
      convectionCoefficient: 12,
      wall: { layers: [{ thickness: 0.2, conductivity: 1 }], outsideTemperature: 300, outsideCoefficient: 10 },
    });
    const tube = {
      fluidTemperature: 600,
      insideCoefficient: 900,
      outerDiameter: 0.1,
      innerDiameter: 0.08,
      wallConductivity: 40,
    };
    doc = setCondition(doc, 'outer', { kind: 'tube', ...tube });
    expect(doc.surfaces?.outer).toEqual({ emissivity: 0.8, convectionCoefficient: 12, tube });
    doc = setConvection(doc, 'outer', undefined);
    expect(doc.surfaces?.outer).toEqual({ emissivity: 0.8, tube });
    // The same wall again is no change (no undo step), though it is a new object.
    const walled = setCondition(squares, 'outer', wall);
    expect(setCondition(walled, 'outer', { ...wall, layers: [{ thickness: 0.2, conductivity: 1 }] })).toBe(walled);
  });

  it('a linked face may name only a used face with no condition of its own that no other face names', () => {
    const plate: SketchFile = {
      ...squares,
      shapes: [squares.shapes[0], { ...squares.shapes[1], surface: ['bottom', 'end', 'top', 'end'] }],
      surfaces: { outer: { temperature: 500 } },
    };
    expect(linkChoices(plate, 'top')).toEqual(['bottom', 'end']);
    const linked = setCondition(plate, 'top', { kind: 'linked', surface: 'bottom' });
    expect(linked.surfaces?.top).toEqual({ linked: 'bottom' });
    expect(linkChoices(linked, 'end')).toEqual([]); // bottom is taken, top has its own condition, outer is held
    expect(linkChoices(linked, 'top')).toEqual(['bottom', 'end']);
    expect(documentApi.restore(linked).ok).toBe(true);
  });

  it('the gas temperature is a setting like the others', () => {
    let doc = setSettings(squares, { gasTemperature: 1400, depth: 2 });
    expect(doc.settings).toEqual({ gasTemperature: 1400, depth: 2 });
    doc = setSettings(doc, { gasTemperature: undefined });
    expect(doc.settings).toEqual({ depth: 2 });
  });
});
