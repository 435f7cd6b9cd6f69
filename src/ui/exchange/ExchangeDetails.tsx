// Beside the net heat table: a copy of it for a spreadsheet, the net exchange
// matrix q'_ij (W per metre of depth, from row to column) and each surface's
// radiosity and irradiation (W/m^2), each copyable as tab-separated text.
import { useId } from 'react';
import type { ExchangeSolved } from '../../state/exchange/slice';
import { exchangeMatrixTsv, netHeatTsv, radiosityRows, radiosityTsv } from '../../state/exchange/tables';
import { CopyTableButton } from './CopyTableButton';
import { ExchangeMatrix } from './ExchangeMatrix';
import { fmtHeat } from './format';

export function ExchangeDetails({ ex }: { ex: ExchangeSolved }) {
  const id = useId();
  const radiosity = radiosityRows(ex);
  const stale = ex.stale ? ' stale' : '';
  return (
    <div className="exchange-details">
      <CopyTableButton what="Net heat table" tsv={() => netHeatTsv(ex)} label="Copy net heat table" />
      <h4 id={`${id}-matrix`}>Net exchange q′ᵢⱼ, W per metre of depth, from row to column</h4>
      <ExchangeMatrix ex={ex} labelledBy={`${id}-matrix`} />
      <CopyTableButton what="Exchange matrix" tsv={() => exchangeMatrixTsv(ex)} label="Copy matrix" />
      <h4 id={`${id}-radiosity`}>Radiosity and irradiation, W/m²</h4>
      <div className="matrix-scroll exchange-scroll">
        <table className={`matrix radiosity-table${stale}`} aria-labelledby={`${id}-radiosity`}>
          <thead>
            <tr>
              <th scope="col">surface</th>
              <th scope="col" title="Radiosity J: all radiation leaving the surface (emitted and reflected)">
                radiosity J
              </th>
              <th scope="col" title="Irradiation G: all radiation arriving at the surface">
                irradiation G
              </th>
            </tr>
          </thead>
          <tbody>
            {radiosity.map((r) => (
              <tr key={r.name} data-surface={r.name}>
                <th scope="row">{r.name}</th>
                <td className="num" data-value={r.radiosity}>
                  {fmtHeat(r.radiosity)}
                </td>
                <td className="num" data-value={r.irradiation}>
                  {fmtHeat(r.irradiation)}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <CopyTableButton what="Radiosity table" tsv={() => radiosityTsv(ex)} label="Copy radiosities" />
    </div>
  );
}
