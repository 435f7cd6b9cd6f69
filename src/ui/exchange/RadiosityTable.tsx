// Each surface's radiosity and irradiation (W/m^2). Above ROWS_WINDOW_FROM
// surfaces only the rows in view are drawn, as in the net heat table: a
// 1012-surface sketch otherwise re-drew 3000 cells after every edit.
import { useRef, type Ref } from 'react';
import type { ExchangeSolved } from '../../state/exchange/slice';
import { radiosityRows } from '../../state/exchange/tables';
import { Spacer } from '../matrix/MatrixRow';
import { fmtHeat } from './format';
import { ROWS_WINDOW_FROM, useRowWindow, type RowWindow } from './useRowWindow';

interface Props {
  ex: ExchangeSolved;
  labelledBy: string;
}

export function RadiosityTable(props: Props) {
  return props.ex.names.length > ROWS_WINDOW_FROM ? <Windowed {...props} /> : <Body {...props} />;
}

function Windowed(props: Props) {
  const ref = useRef<HTMLTableElement>(null);
  const win = useRowWindow(ref, props.ex.names.length, props.ex);
  return <Body {...props} tableRef={ref} win={win} />;
}

function Body({ ex, labelledBy, tableRef, win }: Props & { tableRef?: Ref<HTMLTableElement>; win?: RowWindow }) {
  const rows = radiosityRows(ex);
  return (
    <div className={`matrix-scroll exchange-scroll${win ? ' windowed' : ''}`}>
      <table
        ref={tableRef}
        className={`matrix radiosity-table${ex.stale ? ' stale' : ''}`}
        aria-labelledby={labelledBy}
        aria-rowcount={win ? rows.length + 1 : undefined}
      >
        <thead>
          <tr aria-rowindex={win ? 1 : undefined}>
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
          {win && <Spacer px={win.before} />}
          {(win ? win.rows : rows.map((_, k) => k)).map((k) => (
            <tr key={rows[k].name} data-surface={rows[k].name} aria-rowindex={win ? k + 2 : undefined}>
              <th scope="row">{rows[k].name}</th>
              <td className="num" data-value={rows[k].radiosity}>
                {fmtHeat(rows[k].radiosity)}
              </td>
              <td className="num" data-value={rows[k].irradiation}>
                {fmtHeat(rows[k].irradiation)}
              </td>
            </tr>
          ))}
          {win && <Spacer px={win.after} />}
        </tbody>
      </table>
    </div>
  );
}
