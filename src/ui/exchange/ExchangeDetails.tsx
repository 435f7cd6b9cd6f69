// Beside the net heat table: a copy of it for a spreadsheet, the net exchange
// matrix q'_ij (W per metre of depth, from row to column) and each surface's
// radiosity and irradiation (W/m^2), each copyable as tab-separated text.
import { useId } from 'react';
import type { ExchangeSolved } from '../../state/exchange/slice';
import { exchangeMatrixTsv, netHeatTsv, radiosityTsv } from '../../state/exchange/tables';
import { CopyTableButton } from './CopyTableButton';
import { ExchangeMatrix } from './ExchangeMatrix';
import { RadiosityTable } from './RadiosityTable';

export function ExchangeDetails({ ex }: { ex: ExchangeSolved }) {
  const id = useId();
  return (
    <div className="exchange-details">
      <CopyTableButton what="Net heat table" tsv={() => netHeatTsv(ex)} label="Copy net heat table" />
      <h4 id={`${id}-matrix`}>Net exchange q′ᵢⱼ, W per metre of depth, from row to column</h4>
      <ExchangeMatrix ex={ex} labelledBy={`${id}-matrix`} />
      <CopyTableButton what="Exchange matrix" tsv={() => exchangeMatrixTsv(ex)} label="Copy matrix" />
      <h4 id={`${id}-radiosity`}>Radiosity and irradiation, W/m²</h4>
      <RadiosityTable ex={ex} labelledBy={`${id}-radiosity`} />
      <CopyTableButton what="Radiosity table" tsv={() => radiosityTsv(ex)} label="Copy radiosities" />
    </div>
  );
}
