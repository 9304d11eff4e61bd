import { payloadRangeDiagram } from '../../engine/analysis';
import { analysisFailed, printJsonReport, printReport } from '../common/report';
import { formatTable, numberColumns, textColumns } from '../format/textTable';
import { optionalString, UsageError, type CliIo, type Verb } from '../verb';
import { bothUnits, INLET_OPTION, JSON_OPTION, openAnalysisProject } from './analysisArgs';
import { verbSummary } from './catalogue';
import { NAUTICAL_MILE_M } from '../../engine/units';

export const payloadRangeVerb: Verb = {
  name: 'payload-range',
  summary: verbSummary('payload-range'),
  help: `blockwise payload-range — payload against range, each point a full mission with reserves

Usage: blockwise payload-range <project.blockwise.json> [--inlet <name>] [--between <n>] [--json]

Options:
  --inlet    use this inlet design instead of the project's active one
  --between  missions between corner points on each segment (default 3, at most 50)
  --json     print the result as JSON (SI)

Corner points: maximum payload (MZFW - OEW) at MTOW, MTOW with full tanks,
and ferry (no payload, full tanks). Every point is flown by the mission
solver in maximum-range mode with the project's legs and reserves. Exit
codes: 0 done; 1 project unreadable; 2 bad command line; 3 a mission failed.
`,
  options: { ...INLET_OPTION, between: { type: 'string' }, ...JSON_OPTION },
  allowPositionals: true,
  async run(values, positionals, io: CliIo): Promise<number> {
    const betweenText = optionalString(values, 'between');
    const between = betweenText === undefined ? 3 : Number(betweenText);
    if (!Number.isInteger(between) || between < 0 || between > 50) {
      throw new UsageError(`--between: expected a whole number 0..50, got ${JSON.stringify(betweenText)}`);
    }
    const loaded = await openAnalysisProject(values, positionals, 'payload-range', io);
    if (typeof loaded === 'number') return loaded;
    const { input } = loaded;
    const r = payloadRangeDiagram(input, { pointsBetween: between });
    if (!r.ok) return analysisFailed(io, 'payload-range', r.error.message);
    const v = r.value;
    if (values.json === true) {
      printJsonReport(io, { inlet: input.propulsion.inletName, ...v });
      return 0;
    }
    const label: Record<string, string> = { maxPayload: 'max payload', mtowFullFuel: 'MTOW, full tanks', ferry: 'ferry', between: '' };
    const rows = v.points.map((p) => [
      label[p.kind] ?? p.kind,
      (p.range_m / NAUTICAL_MILE_M).toFixed(0),
      p.payload_kg.toFixed(0),
      p.takeoffMass_kg.toFixed(0),
      p.fuelOnBoard_kg.toFixed(0),
      p.blockFuel_kg.toFixed(0),
      p.reserveFuel_kg.toFixed(0),
    ]);
    printReport(io, [
      `Payload-range — inlet "${input.propulsion.inletName}"; MTOW ${bothUnits(input.airframe.mtow_kg, 'mass')}, max fuel ${bothUnits(input.airframe.maxFuel_kg, 'mass')}`,
      `  ${v.note}`,
      '',
      formatTable(
        [...textColumns('point'), ...numberColumns('range nmi', 'payload kg', 'TOW kg', 'fuel on board kg', 'block fuel kg', 'reserve kg')],
        rows,
      ),
      '',
      `  ${v.missions} missions flown.`,
    ]);
    return 0;
  },
};
