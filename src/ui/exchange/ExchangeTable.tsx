import { memo, useRef, type Ref } from 'react';
import { useApp } from '../AppContext';
import { selectTemperatureUnit } from '../../state/exchange/selectors';
import type { ExchangeSolved, TemperatureUnit } from '../../state/exchange/slice';
import { TEMPERATURE_LABEL } from '../../state/exchange/units';
import { fmtHeat, fmtTemperature } from './format';
import { exchangeRows, type ExchangeRow } from './rows';
import { ROWS_WINDOW_FROM, useRowWindow, type RowWindow } from './useRowWindow';
import { Spacer } from '../matrix/MatrixRow';

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
export function ExchangeTable(props: Props) {
  return exchangeRows(props.ex).length > ROWS_WINDOW_FROM ? <WindowedTable {...props} /> : <TableBody {...props} />;
}

/** Only the rows in view are drawn (aria-rowcount and each row's aria-rowindex say where they are). */
function WindowedTable(props: Props) {
  const ref = useRef<HTMLTableElement>(null);
  const win = useRowWindow(ref, exchangeRows(props.ex).length, props.ex);
  return <TableBody {...props} tableRef={ref} win={win} />;
}

function TableBody({
  ex,
  current,
  onChoose,
  tableRef,
  win,
}: Props & { tableRef?: Ref<HTMLTableElement>; win?: RowWindow }) {
  const unit = useApp(selectTemperatureUnit);
  const rows = exchangeRows(ex);
  const depth = ex.result.depth;
  const inside = rows.some((row) => row.inside !== undefined);
  return (
    <div className={`matrix-scroll exchange-scroll${win ? ' windowed' : ''}`}>
      <table
        ref={tableRef}
        className={`matrix exchange-table${ex.stale ? ' stale' : ''}`}
        aria-label="Heat exchange per surface"
        aria-rowcount={win ? rows.length + 1 : undefined}
      >
        <caption>
          Per metre of depth{depth !== undefined ? `; totals over a depth of ${fmtHeat(depth)} m` : ''}. Radiation and
          convection &gt; 0: heat leaves the front; back = radiation + convection, the heat supplied from behind.
        </caption>
        <thead>
          <tr aria-rowindex={win ? 1 : undefined}>
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
          {win && <Spacer px={win.before} />}
          {(win ? win.rows : rows.map((_, k) => k)).map((k) => (
            <ExchangeRowView
              key={rows[k].name}
              row={rows[k]}
              unit={unit}
              on={rows[k].index !== null && rows[k].name === current}
              inside={inside}
              depth={depth !== undefined}
              onChoose={onChoose}
              ariaRow={win ? k + 2 : undefined}
            />
          ))}
          {win && <Spacer px={win.after} />}
        </tbody>
      </table>
    </div>
  );
}

interface RowProps {
  row: ExchangeRow;
  unit: TemperatureUnit;
  on: boolean;
  inside: boolean;
  depth: boolean;
  onChoose: (name: string) => void;
  ariaRow: number | undefined;
}

/** One surface's row; re-renders only when its own figures or marks change. */
const ExchangeRowView = memo(function ExchangeRowView({ row, unit, on, inside, depth, onChoose, ariaRow }: RowProps) {
  return (
    <tr className={on ? 'on' : undefined} data-surface={row.name} aria-rowindex={ariaRow}>
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
      {depth && (
        <td className="num" data-value={row.total}>
          {row.total === undefined ? '' : fmtHeat(row.total)}
        </td>
      )}
    </tr>
  );
});
