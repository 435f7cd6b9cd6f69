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

/**
 * Per surface: condition, emissivity, temperature, its heat split into
 * radiation, convection and the back (supplied), net flux, a wall's cold face
 * or a tube's inner wall temperature with the burn warning beside a hot
 * casing, and the total over the depth.
 */
export function ExchangeTable({ ex, current, onChoose }: Props) {
  const unit = useApp(selectTemperatureUnit);
  const rows = exchangeRows(ex);
  const depth = ex.result.depth;
  const inside = rows.some((row) => row.inside !== undefined);
  return (
    <div className="matrix-scroll exchange-scroll">
      <table className={`matrix exchange-table${ex.stale ? ' stale' : ''}`} aria-label="Heat exchange per surface">
        <caption>
          Per metre of depth{depth !== undefined ? `; totals over a depth of ${fmtHeat(depth)} m` : ''}. Radiation and
          convection &gt; 0: heat leaves the front; back = radiation + convection, the heat supplied from behind.
        </caption>
        <thead>
          <tr>
            <th scope="col">surface</th>
            <th scope="col">condition</th>
            <th scope="col" title="Emissivity used (openings and the surroundings are black)">
              ε
            </th>
            <th scope="col">T ({TEMPERATURE_LABEL[unit]})</th>
            <th scope="col" title="Net radiation leaving the front, W per metre of depth">
              radiation (W/m)
            </th>
            <th scope="col" title="Convection leaving the front to the gas, W per metre of depth">
              convection (W/m)
            </th>
            <th
              scope="col"
              title="Heat supplied from behind (firing, minus a wall's loss or what a tube's fluid takes up), W/m"
            >
              back (W/m)
            </th>
            <th scope="col" title="Net heat per m² of the surface">
              net flux (W/m²)
            </th>
            {inside && (
              <th scope="col" title="A wall's cold face (casing) or a tube's inner wall temperature">
                cold face / inner ({TEMPERATURE_LABEL[unit]})
              </th>
            )}
            {depth !== undefined && (
              <th scope="col" title="Net radiation over the whole depth">
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
              <td className="num">{row.emissivity === undefined ? '' : fmtHeat(row.emissivity)}</td>
              <td className="num" data-value={row.temperature}>
                {fmtTemperature(row.temperature, unit)}
              </td>
              <td className="num" data-value={row.netHeat}>
                {row.netHeat === undefined ? '' : fmtHeat(row.netHeat)}
              </td>
              <td className="num" data-value={row.convection}>
                {fmtHeat(row.convection)}
              </td>
              <td className="num" data-value={row.supplied}>
                {fmtHeat(row.supplied)}
              </td>
              <td className="num" data-value={row.netFlux}>
                {row.netFlux === undefined ? '' : fmtHeat(row.netFlux)}
              </td>
              {inside && (
                <td
                  className={`num${row.burn ? ' warn' : ''}`}
                  data-value={row.inside?.kelvin}
                  title={row.burn ?? row.inside?.what}
                >
                  {row.inside === undefined ? '' : fmtTemperature(row.inside.kelvin, unit)}
                  {row.burn && (
                    <span className="burn-mark" role="img" aria-label={row.burn}>
                      {' '}
                      ⚠ hot
                    </span>
                  )}
                </td>
              )}
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
