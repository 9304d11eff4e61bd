import { optimumAltitude, type OptimumAltitudeResult, specificRange } from '../../engine/analysis';

const OPTIMUM_BINDING_TEXT: Readonly<Record<OptimumAltitudeResult['binding'], string>> = {
  specificRange: 'the best specific range (no limit binds)',
  cruiseCeiling: 'the cruise ceiling (residual climb rate)',
  buffetMargin: 'the buffet margin',
};
import { analysisFailed, cautionBlock, isaText, printJsonReport, printReport } from '../common/report';
import { formatTable, numberColumns } from '../format/textTable';
import type { CliIo, Verb } from '../verb';
import { bothUnits, INLET_OPTION, ISA_DEV_OPTION, isaDevOption, JSON_OPTION, machText, openAnalysisProject, pointCondition, POINT_OPTIONS } from './analysisArgs';
import { verbSummary } from './catalogue';
import { NAUTICAL_MILE_M } from '../../engine/units';

const NMI_M = NAUTICAL_MILE_M;

export const rangeSpeedsVerb: Verb = {
  name: 'range-speeds',
  summary: verbSummary('range-speeds'),
  help: `blockwise range-speeds — specific range, best cruise speeds and optimum altitude

Usage: blockwise range-speeds <project.blockwise.json> --altitude <alt> --weight <mass>
         [--inlet <name>] [--isa-dev <dT>] [--json]

Options:
  --altitude  pressure altitude, e.g. "35000 ft"
  --weight    aircraft mass, e.g. "30000 lb"
  --inlet     use this inlet design instead of the project's active one
  --isa-dev   ISA temperature deviation (default: the project's)
  --json      print the result as JSON (SI; specific range in m/kg)

Specific range = TAS / fuel flow, with fuel flow at the part power where
installed thrust equals drag (at most maxCruise). The long-range Mach is the
faster Mach at 99 % of the best specific range (common practice). The
optimum altitude maximises the best specific range at this weight among the
altitudes meeting the cruise-ceiling climb rate and the buffet margin of the
project's caution settings (both shown, with the one that binds); an MMO
caution is raised there. Exit codes: 0 done; 1 project
unreadable; 2 bad command line; 3 analysis failed.
`,
  options: { ...POINT_OPTIONS, ...INLET_OPTION, ...ISA_DEV_OPTION, ...JSON_OPTION },
  allowPositionals: true,
  async run(values, positionals, io: CliIo): Promise<number> {
    const { altitude_m, mass_kg } = pointCondition(values);
    const loaded = await openAnalysisProject(values, positionals, 'range-speeds', io);
    if (typeof loaded === 'number') return loaded;
    const { input } = loaded;
    const isaDev_K = isaDevOption(values, input.isaDev_K);
    const models = { aero: input.aero, propulsion: input.propulsion };
    const sr = specificRange(models, { altitude_m, mass_kg, isaDev_K, cautionSettings: input.cautionSettings, mmo: input.airframe.mmo });
    if (!sr.ok) return analysisFailed(io, 'range-speeds', sr.error.message);
    const opt = optimumAltitude(models, { mass_kg, isaDev_K, mmo: input.airframe.mmo, cautionSettings: input.cautionSettings });
    if (values.json === true) {
      printJsonReport(io, {
        inlet: input.propulsion.inletName,
        specificRange: sr.value,
        optimumAltitude: opt.ok ? opt.value : null,
        optimumAltitudeError: opt.ok ? null : opt.error,
      });
      return 0;
    }
    const v = sr.value;
    const perKg = (x: number | null) => (x === null ? '-' : ((x / NMI_M) * 1000).toFixed(1));
    const rows = v.curves.mach
      .map((m, i) => [m.toFixed(3), ((v.curves.tas_m_s[i]! * 3600) / NMI_M).toFixed(0), v.curves.fuelFlow_kg_s[i] == null ? '-' : (v.curves.fuelFlow_kg_s[i]! * 3600).toFixed(0), perKg(v.curves.specificRange_m_kg[i]!)])
      .filter((_, i) => i % 4 === 0 || i === v.curves.mach.length - 1);
    const o = opt.ok ? opt.value : null;
    printReport(io, [
      `Specific range — inlet "${input.propulsion.inletName}", ${bothUnits(altitude_m, 'altitude')}, ${bothUnits(mass_kg, 'mass')}, ${isaText(isaDev_K)}`,
      '',
      `  maximum-range Mach      ${machText(v.maxRangeMach)}   (${perKg(v.maxSpecificRange_m_kg)} nmi per 1000 kg)`,
      `  long-range Mach (99 %)  ${machText(v.longRangeMach)}${v.longRangeMach === null ? '   (beyond the level-flight band at maxCruise)' : ''}`,
      `  level-flight band       M ${machText(v.feasibleMachRange[0])} to ${machText(v.feasibleMachRange[1])}`,
      o === null
        ? `  optimum altitude        - (${opt.ok ? '' : opt.error.message})`
        : `  optimum altitude        ${bothUnits(o.altitude_m, 'altitude')} at M ${machText(o.maxRangeMach)} (${perKg(o.specificRange_m_kg)} nmi per 1000 kg; ${o.buffetLoadFactor.toFixed(2)} g to buffet; climb ${bothUnits(o.climbRate_m_s, 'climbRate')}), set by ${OPTIMUM_BINDING_TEXT[o.binding]}`,
      ...(o === null
        ? []
        : [
            `  best SR, no limits      ${bothUnits(o.unconstrainedAltitude_m, 'altitude')}`,
            `  cruise ceiling          ${o.cruiseCeilingAltitude_m === null ? 'above the scan' : bothUnits(o.cruiseCeilingAltitude_m, 'altitude')} (climb ${bothUnits(o.limits.minClimbRate_m_s, 'climbRate')} at maxClimb, best-range Mach)`,
            `  buffet-margin limit     ${o.buffetLimitAltitude_m === null ? 'above the scan' : bothUnits(o.buffetLimitAltitude_m, 'altitude')} (${o.limits.minBuffetLoadFactor.toFixed(2)} g to buffet onset)`,
          ]),
      '',
      formatTable(
        numberColumns('Mach', 'TAS kt', 'fuel kg/h', 'nmi/1000 kg'),
        rows,
      ),
      ...cautionBlock([...v.cautions, ...(o?.cautions ?? [])]),
    ]);
    return 0;
  },
};
