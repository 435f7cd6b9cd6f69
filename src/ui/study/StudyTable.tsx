// The study's numbers: one row per value, each shown surface's result.
import type { SweepTable } from '../../state/study';

const cell = (v: number) => String(Number(v.toPrecision(6)));

interface Props {
  table: SweepTable;
  /** Which result: net heat (W/m) or temperature (K). */
  result: 'netHeat' | 'temperature';
  shown: readonly number[];
}

export function StudyTable({ table, result, shown }: Props) {
  const unit = result === 'netHeat' ? 'W/m' : 'K';
  const rows = result === 'netHeat' ? table.netHeat : table.temperature;
  return (
    <div className="study-table-wrap">
      <table className="study-table" aria-label="Study results per value">
        <thead>
          <tr>
            <th scope="col">{table.unit ? `${table.label} (${table.unit})` : table.label}</th>
            {shown.map((i) => (
              <th scope="col" key={table.names[i]}>
                {table.names[i]} ({unit})
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {table.values.map((v, k) => (
            <tr key={k}>
              <th scope="row">{cell(v)}</th>
              {shown.map((i) => (
                <td key={table.names[i]}>{cell(rows[k][i])}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
