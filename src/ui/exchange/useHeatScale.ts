import { useMemo } from 'react';
import { useApp } from '../AppContext';
import { selectExchange, selectHeatColouring, selectTemperatureUnit } from '../../state/exchange/selectors';
import { heatScale, type HeatScale } from './heatScale';

/** The canvas colour scale for the current colouring and results, or null (off, or nothing solved). */
export function useHeatScale(): { scale: HeatScale | null; stale: boolean } {
  const mode = useApp(selectHeatColouring);
  const ex = useApp(selectExchange);
  const unit = useApp(selectTemperatureUnit);
  const scale = useMemo(() => heatScale(mode, ex, unit), [mode, ex, unit]);
  return { scale, stale: ex.kind !== 'none' && ex.stale };
}
