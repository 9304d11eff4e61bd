import { tradeFactors } from '../../engine/analysis';
import { installationOf } from '../../engine/project';
import { analysisFailed, printJsonReport, printReport } from '../common/report';
import { formatTable, numberColumns, textColumns } from '../format/textTable';
import { assumptionLines } from '../format/missionSummaryText';
import { installationAssumptions } from '../../engine/project';
import type { CliIo, Verb } from '../verb';
import { INLET_OPTION, JSON_OPTION, openAnalysisProject } from './analysisArgs';
import { recoveryTradeByMethod, type KnownRecoveryTrade } from '../../engine/analysis';
import type { MissionInput } from '../../engine/mission';
import { recoveryMethodVariants } from '../../engine/project';
import { verbSummary } from './catalogue';
import { NAUTICAL_MILE_M } from '../../engine/units';

export const tradeVerb: Verb = {
  name: 'trade',
  summary: verbSummary('trade'),
  help: `blockwise trade — what a change in the installation is worth in block fuel

Usage: blockwise trade <project.blockwise.json> [--inlet <name>] [--json]

Options:
  --inlet  use this inlet design instead of the project's active one
  --json   print the result as JSON (SI)

Changes of block fuel at the design mission (the project's payload and
range; a project in another solve mode is flown once to fix them) for
+1 % inlet recovery, +1 drag count, +1 % TSFC and +100 kg OEW, each by
central differences with steps of one and half a unit; both are printed and
flagged when they disagree by more than 5 %. Then the +1 % recovery factor by
every recovery method side by side: Raymer's rule with fuel flow held and
with fuel flow scaled with recovery, the deck's sensitivity columns (when
the deck has them) and the cycle (when the engine is a cycle). Exit codes: 0 done; 1 project
unreadable; 2 bad command line; 3 the design mission failed.
`,
  options: { ...INLET_OPTION, ...JSON_OPTION },
  allowPositionals: true,
  async run(values, positionals, io: CliIo): Promise<number> {
    const loaded = await openAnalysisProject(values, positionals, 'trade', io);
    if (typeof loaded === 'number') return loaded;
    const { input, project, deck } = loaded;
    const cRam = installationOf(project).cRam;
    const r = tradeFactors(input, cRam === undefined ? {} : { cRam });
    if (!r.ok) return analysisFailed(io, 'trade', r.error.message);
    const v = r.value;
    // The project's own recovery method is the trade factors' recovery factor on the same input: taken, not flown again.
    const recovery = v.factors.find((f) => f.name === 'recovery');
    const own: KnownRecoveryTrade | undefined =
      input.solve.kind === 'payloadRange' && input.propulsion.withRecoveryOffset !== undefined && recovery?.blockFuelPerUnit_kg != null && recovery.blockFuelPerUnitHalfStep_kg != null
        ? { baselineBlockFuel_kg: v.baselineBlockFuel_kg, blockFuelPerPercent_kg: recovery.blockFuelPerUnit_kg, halfStep_kg: recovery.blockFuelPerUnitHalfStep_kg }
        : undefined;
    const byMethod = recoveryTradeByMethod(recoveryMethodVariants(project, deck, input.propulsion.inletName), {
      reuse: (c) => (own !== undefined && !('unavailable' in c.input) && sameFlight(c.input, input) ? own : undefined),
    });
    if (!byMethod.ok) return analysisFailed(io, 'trade', byMethod.error.message);
    const assumptions = installationAssumptions(project, deck.hasSensitivities).map((a) => a.text);
    if (values.json === true) {
      printJsonReport(io, { inlet: input.propulsion.inletName, installationMethod: input.propulsion.installationMethod, ...v, recoveryByMethod: byMethod.value, assumptions });
      return 0;
    }
    const m = byMethod.value;
    const kg = (x: number | null) => (x === null ? '-' : `${x >= 0 ? '+' : ''}${x.toFixed(2)}`);
    printReport(io, [
      `Trade factors — inlet "${input.propulsion.inletName}", design mission ${(v.designMission.range_m / NAUTICAL_MILE_M).toFixed(0)} nmi with ${v.designMission.payload_kg.toFixed(0)} kg payload; block fuel ${v.baselineBlockFuel_kg.toFixed(1)} kg`,
      '',
      formatTable(
        [...textColumns('change'), ...numberColumns('block fuel kg', 'half step kg'), ...textColumns('steps agree')],
        v.factors.map((f) => [f.unit, kg(f.blockFuelPerUnit_kg), kg(f.blockFuelPerUnitHalfStep_kg), f.converged ? 'yes' : 'NO']),
      ),
      ...v.factors.filter((f) => f.note !== null).map((f) => `  ${f.name}: ${f.note}`),
      `  Steps agree when |d(1) - d(1/2)| <= ${v.tolerance.rel * 100} % of d(1/2) + ${v.tolerance.abs_kg} kg. ${v.missions} missions flown.`,
      `  ${v.recoveryMethod}`,
      '',
      "+1 % recovery by each method (the check of Raymer's rule against the deck's sensitivities and the cycle):",
      formatTable(
        [...textColumns('method'), ...numberColumns('block fuel kg', 'half step kg', 'vs first', 'baseline kg')],
        m.rows.map((row, i) => [
          row.label,
          kg(row.blockFuelPerPercent_kg),
          kg(row.halfStep_kg),
          m.relativeToFirst[i] == null ? '-' : `${m.relativeToFirst[i]! >= 0 ? '+' : ''}${(100 * m.relativeToFirst[i]!).toFixed(0)} %`,
          row.baselineBlockFuel_kg === null ? '-' : row.baselineBlockFuel_kg.toFixed(1),
        ]),
      ),
      ...m.rows.filter((row) => row.note !== null).map((row) => `  ${row.label}: ${row.note}`),
      `  ${m.description} ${m.missions} missions${m.reused.length === 0 ? '' : `; ${m.rows.filter((row) => m.reused.includes(row.id)).map((row) => `"${row.label}"`).join(', ')} is the project's own method, its row the recovery factor above`}.`,
      ...assumptionLines(assumptions),
    ]);
    return 0;
  },
};

/**
 * True when two mission inputs built from the same project and deck fly the
 * same aircraft: equal data (airframe, legs, reserves, solve mode, settings)
 * and models that answer a few probes identically (drag, thrust and fuel
 * flow at two ratings, part power, recovery raised by 0.01, the installation
 * method), so one's computed trade is the other's.
 */
function sameFlight(a: MissionInput, b: MissionInput): boolean {
  const data = (m: MissionInput) => JSON.stringify({ ...m, aero: null, propulsion: null });
  if (data(a) !== data(b)) return false;
  const pa = a.propulsion;
  const pb = b.propulsion;
  if (pa.installationMethod !== pb.installationMethod || pa.inletName !== pb.inletName || pa.engineCount !== pb.engineCount) return false;
  const points = [
    { altitude_m: 0, mach: 0.25, isaDev_K: 0 },
    { altitude_m: 11000, mach: 0.78, isaDev_K: 10 },
  ];
  const same = (x: { thrust_N: number; fuelFlow_kg_s: number }, y: { thrust_N: number; fuelFlow_kg_s: number }) => x.thrust_N === y.thrust_N && x.fuelFlow_kg_s === y.fuelFlow_kg_s;
  const ra = pa.withRecoveryOffset?.(0.01);
  const rb = pb.withRecoveryOffset?.(0.01);
  for (const c of points) {
    for (const rating of ['maxClimb', 'flightIdle'] as const) {
      if (!same(pa.atRating(c, rating), pb.atRating(c, rating))) return false;
      if (ra !== undefined && rb !== undefined && !same(ra.atRating(c, rating), rb.atRating(c, rating))) return false;
    }
    const half = 0.5 * pa.atRating(c, 'maxCruise').thrust_N;
    if (!same(pa.forThrust(c, half), pb.forThrust(c, half))) return false;
    const q = { altitude_m: c.altitude_m, mach: c.mach, mass_kg: a.airframe.oew_kg, loadFactor: 1 };
    if (a.aero.drag(q).drag_N !== b.aero.drag(q).drag_N) return false;
  }
  return (ra === undefined) === (rb === undefined);
}
