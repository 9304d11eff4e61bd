import type { LegRow } from '../../engine/mission';
import { formatQuantity, type UnitSystem } from '../../engine/units';

/** The flown legs: times, distances, altitudes, masses and fuel; the highlighted leg is marked. */
export function LegsTable(props: { readonly legs: readonly LegRow[]; readonly units: UnitSystem; readonly highlightLeg: number | null; readonly testId?: string }) {
  const u = props.units;
  const testId = props.testId ?? 'legs';
  return (
    <table className="legs-table" data-testid={`${testId}-table`}>
      <thead>
        <tr>
          <th>#</th>
          <th>Leg</th>
          <th>Start</th>
          <th>End</th>
          <th>Distance</th>
          <th>Start altitude</th>
          <th>End altitude</th>
          <th>Start mass</th>
          <th>Fuel</th>
        </tr>
      </thead>
      <tbody>
        {props.legs.map((leg, k) => (
          <tr
            key={`${leg.index}-${leg.kind}-${k}`}
            data-testid={`${testId}-row-${k}`}
            className={props.highlightLeg === leg.index && leg.kind !== 'reserve' ? 'highlighted' : undefined}
            aria-current={props.highlightLeg === leg.index && leg.kind !== 'reserve' ? 'true' : undefined}
          >
            <td>{leg.kind === 'reserve' ? 'R' : leg.index + 1}</td>
            <td>{leg.name}</td>
            <td>{formatQuantity(leg.startTime_s, 'time', u)}</td>
            <td>{formatQuantity(leg.endTime_s, 'time', u)}</td>
            <td>{formatQuantity(leg.endDistance_m - leg.startDistance_m, 'distance', u)}</td>
            <td>{formatQuantity(leg.startAltitude_m, 'altitude', u)}</td>
            <td>{formatQuantity(leg.endAltitude_m, 'altitude', u)}</td>
            <td>{formatQuantity(leg.startMass_kg, 'mass', u)}</td>
            <td>{formatQuantity(leg.fuel_kg, 'mass', u)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
