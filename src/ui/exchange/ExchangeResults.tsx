import { useId } from 'react';
import { useApp } from '../AppContext';
import { selectExchange } from '../../state/exchange/selectors';
import { solvedCsv } from '../../state/exchange/export';
import { downloadText } from '../chrome/download';
import { SAFETY_TEXT } from '../chrome/SafetyNote';
import { fmtResidual } from '../matrix/format';
import { GAS_CAUTION, WALL_TUBE_CAUTION } from '../../state/exchange/labels';
import { exchangeRows } from './rows';
import { ExchangeStatus } from './ExchangeStatus';
import { ExchangeTable } from './ExchangeTable';
import { ExchangeDetails } from './ExchangeDetails';
import { NetHeatChart } from './NetHeatChart';
import { ProfilePanel } from './ProfilePanel';
import { useSurfaceChoice } from './useSurfaceChoice';

/** Energy balances above this (relative) are more than rounding: the view factors are not reciprocal enough. */
const BALANCE_TOLERANCE = 1e-9;
/** Below this estimated reciprocal condition number the solve loses most of its digits. */
const CONDITION_WARNING = 1e-10;

/** Results per surface, the energy balance, the solver's message when there is no answer, the chart, and the caution. */
export function ExchangeResults() {
  const id = useId();
  const ex = useApp(selectExchange);
  const { current, choose } = useSurfaceChoice();
  return (
    <section className="exchange-results" aria-labelledby={`${id}-title`}>
      <div className="panel-head">
        <h3 id={`${id}-title`}>Net heat</h3>
        <ExchangeStatus />
      </div>
      <p className="exchange-caution" role="note" aria-label="Caution about these results">
        <strong>Caution:</strong> {SAFETY_TEXT}
      </p>
      {ex.kind === 'error' && (
        <div className="exchange-error" role="alert">
          <p>
            <strong>No results:</strong> {ex.message}
          </p>
          {ex.surface !== undefined && (
            <button type="button" title="Show this surface in the properties above" onClick={() => choose(ex.surface!)}>
              Edit “{ex.surface}”
            </button>
          )}
        </div>
      )}
      {ex.kind === 'solved' && (
        <>
          <ExchangeTable ex={ex} current={current} onChoose={choose} />
          <BalanceCautions ex={ex} />
          <div className="matrix-notes">
            <span
              className={ex.result.energyBalance > BALANCE_TOLERANCE ? 'warn' : undefined}
              title="|sum of the heat supplied to every surface, the gas and the surroundings| relative to the radiation leaving all surfaces; rounding is about 1e-14"
            >
              energy balance residual: {fmtResidual(ex.result.energyBalance)}
              {ex.result.energyBalance > BALANCE_TOLERANCE ? ' — above rounding' : ''}
            </span>
            {ex.result.reciprocalCondition < CONDITION_WARNING && (
              <span className="warn">
                the radiosity equations are nearly singular (reciprocal condition{' '}
                {fmtResidual(ex.result.reciprocalCondition)}): digits may be lost
              </span>
            )}
            {ex.result.depth === undefined && <span>Set a depth below to see totals in W.</span>}
          </div>
          <button
            type="button"
            title="Download the net heat per surface as CSV (same as the command line's exchange --csv)"
            onClick={() => downloadText('net-heat.csv', solvedCsv(ex), 'text/csv')}
          >
            Download net heat CSV
          </button>
          <ExchangeDetails ex={ex} />
          <NetHeatChart ex={ex} />
          <ProfilePanel ex={ex} />
        </>
      )}
    </section>
  );
}

/** Burn warnings beside hot casings, and the cautions on the gas and on walls and tubes when they are modelled. */
function BalanceCautions({ ex }: { ex: Extract<ReturnType<typeof selectExchange>, { kind: 'solved' }> }) {
  const burns = exchangeRows(ex).flatMap((row) => (row.burn ? [row.burn] : []));
  const kinds = new Set(ex.conditions.map((c) => c.kind));
  return (
    <>
      {burns.length > 0 && (
        <ul className="exchange-burns warn" role="alert" aria-label="Burn hazards">
          {burns.map((b) => (
            <li key={b}>{b}</li>
          ))}
        </ul>
      )}
      {ex.result.gasTemperature !== undefined && (
        <p className="hint" role="note" aria-label="Caution about the gas">
          {GAS_CAUTION}
        </p>
      )}
      {(kinds.has('wall') || kinds.has('tube')) && (
        <p className="hint" role="note" aria-label="Caution about walls and tubes">
          {WALL_TUBE_CAUTION}
        </p>
      )}
    </>
  );
}
