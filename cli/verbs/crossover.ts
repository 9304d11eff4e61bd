import { SPEED_LIMIT_SOURCE_TEXT, thrustDragCrossover } from '../../engine/analysis';
import { analysisFailed, cautionBlock, isaText, printJsonReport, printReport } from '../common/report';
import { formatTable, numberColumns } from '../format/textTable';
import type { CliIo, Verb } from '../verb';
import {
  bothUnits,
  INLET_OPTION,
  ISA_DEV_OPTION,
  isaDevOption,
  JSON_OPTION,
  machText,
  openAnalysisProject,
  pointCondition,
  POINT_OPTIONS,
  ratingOption,
} from './analysisArgs';
import { verbSummary } from './catalogue';
import { FOOT_M } from '../../engine/units';

export const crossoverVerb: Verb = {
  name: 'crossover',
  summary: verbSummary('crossover'),
  help: `blockwise crossover — where installed thrust available meets drag in level flight

Usage: blockwise crossover <project.blockwise.json> --altitude <alt> --weight <mass>
         [--rating maxCruise] [--inlet <name>] [--isa-dev <dT>] [--json]

Options:
  --altitude  pressure altitude, e.g. "35000 ft" or "10.5 km" (bare number = m)
  --weight    aircraft mass, e.g. "15000 kg" or "33000 lb"
  --rating    takeoff, maxClimb, maxCruise (default), maxContinuous or flightIdle
  --inlet     use this inlet design instead of the project's active one
  --isa-dev   ISA temperature deviation, e.g. "10 K" (default: the project's)
  --json      print the result as JSON (SI; curves included)

Prints the low and high crossover Machs (null where thrust exceeds drag at
the end of the Mach scan), the Mach of least thrust available (where ram
recovery starts to win back the lapse), the stall Mach that bounds the scan,
and the thrust and drag curves. Above the ceiling for that weight the status
says so. Exit codes: 0 done; 1 project unreadable; 2 bad command line;
3 analysis failed (message on stderr).
`,
  options: {
    ...POINT_OPTIONS,
    rating: { type: 'string' },
    ...INLET_OPTION,
    ...ISA_DEV_OPTION,
    ...JSON_OPTION,
  },
  allowPositionals: true,
  async run(values, positionals, io: CliIo): Promise<number> {
    const { altitude_m, mass_kg } = pointCondition(values);
    const rating = ratingOption(values, 'rating', 'maxCruise');
    const loaded = await openAnalysisProject(values, positionals, 'crossover', io);
    if (typeof loaded === 'number') return loaded;
    const { input } = loaded;
    const isaDev_K = isaDevOption(values, input.isaDev_K);
    const speedLimits = { vmo_m_s: input.airframe.vmo_m_s, mmo: input.airframe.mmo };
    const r = thrustDragCrossover({ aero: input.aero, propulsion: input.propulsion }, { altitude_m, mass_kg, rating, isaDev_K, speedLimits });
    if (!r.ok) return analysisFailed(io, 'crossover', r.error.message);
    const v = r.value;
    if (values.json === true) {
      printJsonReport(io, { inlet: input.propulsion.inletName, deck: input.propulsion.label, ...v });
      return 0;
    }
    const step = Math.max(1, Math.round(v.curves.mach.length / 16));
    const rows = v.curves.mach
      .map((m, i) => [
        m.toFixed(3),
        (v.curves.thrustAvailable_N[i]! / 1000).toFixed(2),
        (v.curves.drag_N[i]! / 1000).toFixed(2),
        (v.curves.excessThrust_N[i]! / 1000).toFixed(2),
        ((v.curves.specificExcessPower_m_s[i]! * 60) / FOOT_M).toFixed(0),
      ])
      .filter((_, i) => i % step === 0 || i === v.curves.mach.length - 1);
    printReport(io, [
      `Thrust-drag crossover — inlet "${input.propulsion.inletName}", ${v.rating}, ${bothUnits(altitude_m, 'altitude')}, ${bothUnits(mass_kg, 'mass')}, ${isaText(isaDev_K)}`,
      `Deck: ${input.propulsion.label}`,
      '',
      `  status                 ${v.status}`,
      `  ${v.message}`,
      `  low-speed limit        ${v.lowSpeedLimit === null ? '- (no level flight inside the limits)' : `M ${machText(v.lowSpeedLimit.mach)} (${SPEED_LIMIT_SOURCE_TEXT[v.lowSpeedLimit.source]}; the highest of stall, buffet onset and the low crossover)`}`,
      `  high-speed limit       ${v.highSpeedLimit === null ? '-' : `M ${machText(v.highSpeedLimit.mach)} (${SPEED_LIMIT_SOURCE_TEXT[v.highSpeedLimit.source]}; the lowest of the high crossover, MMO and VMO)`}`,
      `  buffet onset (1 g)     ${machText(v.buffetOnsetMach)}`,
      `  MMO / VMO Mach         ${machText(v.speedLimitMach)}`,
      `  low crossover Mach     ${machText(v.lowMach)}`,
      `  high crossover Mach    ${machText(v.highMach)}`,
      `  least-thrust Mach      ${machText(v.minThrustMach)}`,
      `  stall Mach (CLmax)     ${machText(v.stallMach)}`,
      `  most excess thrust at  M ${machText(v.maxExcessThrustMach)}`,
      `  best climb (most Ps)   M ${machText(v.bestClimbMach)}, ${v.maxSpecificExcessPower_m_s === null ? '-' : bothUnits(v.maxSpecificExcessPower_m_s, 'climbRate')}`,
      `  tolerance              Mach ${v.tolerance.mach}, |T - D|/D < ${v.tolerance.relativeThrust}`,
      '',
      formatTable(
        numberColumns('Mach', 'thrust kN', 'drag kN', 'excess kN', 'Ps ft/min'),
        rows,
      ),
      ...cautionBlock(v.cautions),
    ]);
    return 0;
  },
};
