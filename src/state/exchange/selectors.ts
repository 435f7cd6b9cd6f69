// Selectors for the heat-exchange slice, at module level so components subscribe to stable functions.
import type { AppState } from '../store';

export const selectExchange = (s: AppState) => s.exchange;
export const selectHeatColouring = (s: AppState) => s.heatColouring;
export const selectTemperatureUnit = (s: AppState) => s.temperatureUnit;
export const selectExchangeSurface = (s: AppState) => s.exchangeSurface;
export const selectSettings = (s: AppState) => s.doc.settings;
