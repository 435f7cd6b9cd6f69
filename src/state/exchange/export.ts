// Export of the shown heat-exchange results: the command line's CSV writer.
import { exchangeCsv } from '../../document/exchangeCsv';
import type { ExchangeSolved } from './slice';

/** CSV of solved results: the same content as `npm run cli -- exchange FILE --csv` for the same sketch. */
export function solvedCsv(ex: ExchangeSolved): string {
  return exchangeCsv({
    units: ex.units,
    names: ex.names,
    surfaceLength: ex.lengths,
    result: ex.result,
    conditions: ex.conditions,
  });
}
