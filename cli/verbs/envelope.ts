import { DEFAULT_RESIDUAL_CLIMB_RATES, flightEnvelope, type HighSpeedLimitSource, type LowSpeedLimitSource } from '../../engine/analysis';
import { analysisFailed, isaText, printJsonReport, printReport } from '../common/report';
import { OPTION_RANGES, quantityOption } from '../common/quantityOptions';

/** --top: above the ground, at most the highest altitude the mission models cover. */
const TOP_RANGE = { ...OPTION_RANGES.flightAltitude, min: 0, minExclusive: true, what: `an altitude above 0 and at most ${OPTION_RANGES.flightAltitude.max} m (98,425 ft), the highest the mission models cover` };
import { formatTable, numberColumns } from '../format/textTable';
import { UsageError, type CliIo, type Verb, stringOptions } from '../verb';
import { bothUnits, INLET_OPTION, ISA_DEV_OPTION, isaDevOption, JSON_OPTION, machText, openAnalysisProject, ratingOption } from './analysisArgs';
import { verbSummary } from './catalogue';
import { FOOT_M } from '../../engine/units';

const LIMIT_TAG: Readonly<Record<LowSpeedLimitSource | HighSpeedLimitSource, string>> = {
  stall: 's',
  buffetOnset: 'b',
  crossover: 'x',
  scanStart: '<',
  scanEnd: '>',
  mmo: 'm',
  vmo: 'v',
};

export const envelopeVerb: Verb = {
  name: 'envelope',
  summary: verbSummary('envelope'),
  help: `blockwise envelope — level-flight envelope and ceilings at one weight

Usage: blockwise envelope <project.blockwise.json> [--weight <mass>] [--rating maxClimb]
         [--inlet <name>] [--isa-dev <dT>] [--top <alt>] [--step <alt>]
         [--service-rate <rate>] [--cruise-rate <rate>] [--json]

Options:
  --weight        aircraft mass (default: the project's MTOW)
  --rating        rating for thrust available (default maxClimb)
  --inlet         use this inlet design instead of the project's active one
  --isa-dev       ISA temperature deviation (default: the project's)
  --top           highest altitude of the table and the ceiling search (default 50000 ft)
  --step          altitude step of the table (default 2000 ft)
  --service-rate  residual climb rate of the service ceiling (default 100 ft/min, common practice)
  --cruise-rate   residual climb rate of the cruise ceiling (default 300 ft/min, common practice)
  --json          print the result as JSON (SI)

Each row gives the crossover Machs, the stall Mach, buffet onset at 1 g and at
the project's buffet-margin load factor, and the VMO/MMO Mach. Climb rate is
the steady climb rate Ps = (T - D) V / W at the best-climb Mach, at constant
TAS (no acceleration factor). Exit codes: 0 done; 1 project unreadable;
2 bad command line; 3 analysis failed.
`,
  options: {
    ...stringOptions('weight', 'rating', 'top', 'step', 'service-rate', 'cruise-rate'),
    ...INLET_OPTION,
    ...ISA_DEV_OPTION,
    ...JSON_OPTION,
  },
  allowPositionals: true,
  async run(values, positionals, io: CliIo): Promise<number> {
    const rating = ratingOption(values, 'rating', 'maxClimb');
    const top_m = quantityOption(values, 'top', 'length', TOP_RANGE, 50000 * FOOT_M);
    const step_m = quantityOption(values, 'step', 'length', OPTION_RANGES.altitudeStep, 2000 * FOOT_M);
    if (top_m / step_m > 2000) {
      // Blame the option the user gave (both given: the step, which sets the row count).
      const blamed = values.step === undefined ? 'top' : 'step';
      throw new UsageError(`--${blamed}: ${String(values[blamed])} gives ${Math.ceil(top_m / step_m)} rows from 0 to --top ${(top_m / FOOT_M).toFixed(0)} ft in steps of ${(step_m / FOOT_M).toFixed(0)} ft; at most 2000`);
    }
    const serviceRate = quantityOption(values, 'service-rate', 'speed', OPTION_RANGES.climbRate, DEFAULT_RESIDUAL_CLIMB_RATES[0]!.climbRate_m_s);
    const cruiseRate = quantityOption(values, 'cruise-rate', 'speed', OPTION_RANGES.climbRate, DEFAULT_RESIDUAL_CLIMB_RATES[1]!.climbRate_m_s);
    const loaded = await openAnalysisProject(values, positionals, 'envelope', io);
    if (typeof loaded === 'number') return loaded;
    const { input } = loaded;
    const mass_kg = quantityOption(values, 'weight', 'mass', OPTION_RANGES.aircraftMass, input.airframe.mtow_kg);
    const isaDev_K = isaDevOption(values, input.isaDev_K);
    const r = flightEnvelope(
      { aero: input.aero, propulsion: input.propulsion },
      {
        mass_kg,
        rating,
        isaDev_K,
        altitudeRange: [0, top_m],
        altitudeStep_m: step_m,
        buffetLoadFactor: input.cautionSettings.minBuffetLoadFactor,
        residualClimbRates: [
          { name: 'service', climbRate_m_s: serviceRate },
          { name: 'cruise', climbRate_m_s: cruiseRate },
        ],
        speedLimits: { vmo_m_s: input.airframe.vmo_m_s, mmo: input.airframe.mmo },
      },
    );
    if (!r.ok) return analysisFailed(io, 'envelope', r.error.message);
    const v = r.value;
    if (values.json === true) {
      printJsonReport(io, { inlet: input.propulsion.inletName, deck: input.propulsion.label, ...v });
      return 0;
    }
    const rows = v.rows.map((row) => [
      (row.altitude_m / FOOT_M).toFixed(0),
      row.lowSpeedLimit === null ? '-' : `${machText(row.lowSpeedLimit.mach)} ${LIMIT_TAG[row.lowSpeedLimit.source]}`,
      row.highSpeedLimit === null ? '-' : `${machText(row.highSpeedLimit.mach)} ${LIMIT_TAG[row.highSpeedLimit.source]}`,
      machText(row.lowMach),
      machText(row.highMach),
      machText(row.stallMach),
      `${machText(row.buffetLowMach)}/${machText(row.buffetHighMach)}`,
      `${machText(row.buffetMarginLowMach)}/${machText(row.buffetMarginHighMach)}`,
      machText(row.speedLimitMach),
      row.maxClimbRate_m_s === null ? '-' : ((row.maxClimbRate_m_s * 60) / FOOT_M).toFixed(0),
    ]);
    printReport(io, [
      `Level-flight envelope — inlet "${input.propulsion.inletName}", ${v.rating}, ${bothUnits(mass_kg, 'mass')}, ${isaText(isaDev_K)}`,
      '',
      'Ceilings:',
      ...v.ceilings.map((c) => `  ${c.name.padEnd(9)} ${c.altitude_m === null ? c.message : `${bothUnits(c.altitude_m, 'altitude')} at M ${machText(c.bestClimbMach)} (residual climb ${bothUnits(c.climbRate_m_s, 'climbRate')})`}`),
      `  ${v.climbRateDefinition}`,
      '',
      'Level flight from M (the highest of stall s, buffet onset b, low crossover x) to M (the lowest of high crossover x, MMO m, VMO v):',
      formatTable(
        numberColumns('alt ft', 'from M', 'to M', 'low cross M', 'high cross M', 'stall M', 'buffet 1g', `buffet ${v.buffetLoadFactor.toFixed(2)}g`, 'VMO/MMO M', 'climb ft/min'),
        rows,
      ),
    ]);
    return 0;
  },
};
