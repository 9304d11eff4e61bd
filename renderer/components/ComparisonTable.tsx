/**
 * The inlet comparison side by side: block fuel, block time, trip fuel,
 * take-off mass, the crossover Machs and the ceilings of designs A and B with
 * B - A. One table for the compare view and the printed report.
 */
import type { InletComparisonResult } from '../../engine/analysis';
import { formatQuantity, type UnitSystem } from '../../engine/units';
import { machText } from '../state/displayText';

export function ComparisonTable(props: { readonly result: InletComparisonResult; readonly units: UnitSystem; readonly idPrefix: string }) {
  const { result: c, units: u, idPrefix: id } = props;
  const massRow = (label: string, of: (d: InletComparisonResult['designs'][number]) => number, diff: number, testId?: string) => (
    <tr>
      <td>{label}</td>
      {c.designs.map((d, k) => (
        <td key={k}>{formatQuantity(of(d), 'mass', u)}</td>
      ))}
      <td {...(testId === undefined ? {} : { 'data-testid': testId })}>{formatQuantity(diff, 'mass', u)}</td>
    </tr>
  );
  return (
    <table data-testid={`${id}-table`} className="compare-table">
      <thead>
        <tr>
          <th />
          {c.designs.map((d, k) => (
            <th key={k} data-testid={`${id}-design-name-${k}`}>
              {k === 0 ? 'A: ' : 'B: '}
              {d.name}
            </th>
          ))}
          <th>B - A</th>
        </tr>
      </thead>
      <tbody>
        {massRow('Block fuel', (d) => d.blockFuel_kg, c.difference.blockFuel_kg, `${id}-diff-block-fuel`)}
        <tr>
          <td>Block time</td>
          {c.designs.map((d, k) => (
            <td key={k}>{formatQuantity(d.blockTime_s, 'time', u)}</td>
          ))}
          <td>{formatQuantity(c.difference.blockTime_s, 'time', u)}</td>
        </tr>
        {massRow('Trip fuel', (d) => d.tripFuel_kg, c.difference.tripFuel_kg)}
        {massRow('Take-off mass', (d) => d.takeoffMass_kg, c.difference.takeoffMass_kg)}
        <tr>
          <td>Low / high crossover Mach</td>
          {c.designs.map((d, k) => (
            <td key={k}>
              {machText(d.crossover.lowMach)} / {machText(d.crossover.highMach)}
            </td>
          ))}
          <td>
            {machText(c.difference.lowMach)} / {machText(c.difference.highMach)}
          </td>
        </tr>
        {c.difference.ceilings.map((ceiling, k) => (
          <tr key={ceiling.name}>
            <td>Ceiling: {ceiling.name}</td>
            {c.designs.map((d, j) => {
              const a = d.ceilings[k]?.altitude_m;
              return <td key={j}>{a === undefined || a === null ? '—' : formatQuantity(a, 'altitude', u)}</td>;
            })}
            <td>{ceiling.altitude_m === null ? '—' : formatQuantity(ceiling.altitude_m, 'altitude', u)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
