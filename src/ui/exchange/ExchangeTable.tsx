import { useApp } from '../AppContext';
import { selectTemperatureUnit } from '../../state/exchange/selectors';
import type { ExchangeSolved } from '../../state/exchange/slice';
import { TEMPERATURE_LABEL } from '../../state/exchange/units';
import { fmtHeat, fmtTemperature } from './format';
import { exchangeRows } from './rows';

interface Props {
  ex: ExchangeSolved;
  current: string | null;
  onChoose: (name: string) => void;
}

/** Per surface: condition, emissivity, temperature, net heat per metre, net flux, and the total over the depth. */
export function ExchangeTable({ ex, current, onChoose }: Props) {
  const unit = useApp(selectTemperatureUnit);
  const rows = exchangeRows(ex);
  const depth = ex.result.depth;
  return (
    <div className="matrix-scroll exchange-scroll">
      <table className={`matrix exchange-table${ex.stale ? ' stale' : ''}`} aria-label="Heat exchange per surface">
        <caption>
          Per metre of depth{depth !== undefined ? `; totals over a depth of ${fmtHeat(depth)} m` : ''}. Net heat &gt;
          0: the surface gives heat off.
        </caption>
        <thead>
          <tr>
            <th scope="col">surface</th>
            <th scope="col">condition</th>
            <th scope="col" title="Emissivity used (openings and the surroundings are black)">
              ε
            </th>
            <th scope="col">T ({TEMPERATURE_LABEL[unit]})</th>
            <th scope="col" title="Net heat per metre of depth, W/m">
              net heat (W/m)
            </th>
            <th scope="col" title="Net heat per m² of the surface">
              net flux (W/m²)
            </th>
            {depth !== undefined && (
              <th scope="col" title="Net heat over the whole depth">
                total (W)
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr
              key={row.name}
              className={row.index !== null && row.name === current ? 'on' : undefined}
              data-surface={row.name}
            >
              <th scope="row">
                {row.index === null ? (
                  row.name
                ) : (
                  <button
                    type="button"
                    className="link"
                    title="Edit this surface's properties"
                    onClick={() => onChoose(row.name)}
                  >
                    {row.name}
                  </button>
                )}
              </th>
              <td>{row.condition}</td>
              <td className="num">{fmtHeat(row.emissivity)}</td>
              <td className="num" data-value={row.temperature}>
                {fmtTemperature(row.temperature, unit)}
              </td>
              <td className="num" data-value={row.netHeat}>
                {fmtHeat(row.netHeat)}
              </td>
              <td className="num" data-value={row.netFlux}>
                {row.netFlux === undefined ? '' : fmtHeat(row.netFlux)}
              </td>
              {depth !== undefined && (
                <td className="num" data-value={row.total}>
                  {row.total === undefined ? '' : fmtHeat(row.total)}
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
