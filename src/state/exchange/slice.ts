// Heat-exchange results: a cache derived from the newest view-factor result and
// the document (live.ts beside this file), never saved and never undone. Also
// the exchange's view state: how the canvas is coloured, the temperature unit
// shown, and which surface the properties panel edits.
import type { StateCreator } from 'zustand';
import type { BalanceCondition, ExchangeResult } from '../../document/exchangeInput';
import type { Units } from '../sketchFile';
import type { AppState } from '../store';

/** 'inside': a wall's cold face and a tube's inner wall temperature (other surfaces uncoloured). */
export type HeatColouring = 'off' | 'netFlux' | 'temperature' | 'inside';

/** Temperatures are kept in kelvin in the file; the app shows and accepts K or degrees Celsius. */
export type TemperatureUnit = 'K' | 'C';

export interface ExchangeSolved {
  kind: 'solved';
  /** Surface names in the order of the view-factor result. */
  names: string[];
  /** Surface lengths in `units` (the file units of the geometry solved). */
  lengths: Float64Array;
  units: Units;
  /** Conditions as solved (a linked plate's faces name each other by index). */
  conditions: BalanceCondition[];
  /** SI results: K, W per metre of depth, W/m^2, W (the whole surface balance). */
  result: ExchangeResult;
  /** True while the geometry solved is not the current document's (a step behind, or the last valid sketch). */
  stale: boolean;
}

export interface ExchangeFailed {
  kind: 'error';
  /** The solver's message (values out of range, no unique answer). */
  message: string;
  /** Name of the surface concerned, when the solver names one. */
  surface: string | undefined;
  stale: boolean;
}

export type ExchangeView = { kind: 'none' } | ExchangeSolved | ExchangeFailed;

export interface ExchangeSlice {
  exchange: ExchangeView;
  heatColouring: HeatColouring;
  temperatureUnit: TemperatureUnit;
  /** Surface shown in the properties panel (null: follow the canvas selection, else the first surface). */
  exchangeSurface: string | null;
  setExchange: (view: ExchangeView) => void;
  setHeatColouring: (mode: HeatColouring) => void;
  setTemperatureUnit: (unit: TemperatureUnit) => void;
  setExchangeSurface: (name: string | null) => void;
}

export const createExchangeSlice: StateCreator<AppState, [], [], ExchangeSlice> = (set) => ({
  exchange: { kind: 'none' },
  heatColouring: 'off',
  temperatureUnit: 'K',
  exchangeSurface: null,
  setExchange: (exchange) => set({ exchange }),
  setHeatColouring: (heatColouring) => set({ heatColouring }),
  setTemperatureUnit: (temperatureUnit) => set({ temperatureUnit }),
  setExchangeSurface: (exchangeSurface) => set({ exchangeSurface }),
});
