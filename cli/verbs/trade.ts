import { tradeFactors } from '../../engine/analysis';
import { installationOf } from '../../engine/project';
import { analysisFailed, printJsonReport, printReport } from '../common/report';
import { formatTable } from '../format/textTable';
import { assumptionLines } from '../format/missionSummaryText';
import { installationAssumptions } from '../../engine/project';
import type { CliIo, Verb } from '../verb';
import { INLET_OPTION, JSON_OPTION, openAnalysisProject } from './analysisArgs';
import { recoveryTradeByMethod } from '../../engine/analysis';
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
    const byMethod = recoveryTradeByMethod(recoveryMethodVariants(project, deck, input.propulsion.inletName));
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
        [
          { header: 'change', align: 'left' },
          { header: 'block fuel kg', align: 'right' },
          { header: 'half step kg', align: 'right' },
          { header: 'steps agree', align: 'left' },
        ],
        v.factors.map((f) => [f.unit, kg(f.blockFuelPerUnit_kg), kg(f.blockFuelPerUnitHalfStep_kg), f.converged ? 'yes' : 'NO']),
      ),
      ...v.factors.filter((f) => f.note !== null).map((f) => `  ${f.name}: ${f.note}`),
      `  Steps agree when |d(1) - d(1/2)| <= ${v.tolerance.rel * 100} % of d(1/2) + ${v.tolerance.abs_kg} kg. ${v.missions} missions flown.`,
      `  ${v.recoveryMethod}`,
      '',
      "+1 % recovery by each method (the check of Raymer's rule against the deck's sensitivities and the cycle):",
      formatTable(
        [
          { header: 'method', align: 'left' },
          { header: 'block fuel kg', align: 'right' },
          { header: 'half step kg', align: 'right' },
          { header: 'vs first', align: 'right' },
          { header: 'baseline kg', align: 'right' },
        ],
        m.rows.map((row, i) => [
          row.label,
          kg(row.blockFuelPerPercent_kg),
          kg(row.halfStep_kg),
          m.relativeToFirst[i] == null ? '-' : `${m.relativeToFirst[i]! >= 0 ? '+' : ''}${(100 * m.relativeToFirst[i]!).toFixed(0)} %`,
          row.baselineBlockFuel_kg === null ? '-' : row.baselineBlockFuel_kg.toFixed(1),
        ]),
      ),
      ...m.rows.filter((row) => row.note !== null).map((row) => `  ${row.label}: ${row.note}`),
      `  ${m.description} ${m.missions} missions.`,
      ...assumptionLines(assumptions),
    ]);
    return 0;
  },
};
