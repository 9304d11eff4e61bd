/** `blockwise cycle point`: the matched cycle at one flight condition, throttle and installation. */
import type { CyclePointResult, CyclePointRequest, CycleThrottle, StationRow } from '../../../engine/cycle/index';
import { RATING_NAMES, type RatingName } from '../../../engine/propulsion';
import { FOOT_M, parseQuantity, POUND_FORCE_N, POUND_KG } from '../../../engine/units';
import { significant } from '../../common/numberText';
import { OPTION_RANGES, optionalQuantityOption, quantityOption } from '../../common/quantityOptions';
import { analysisFailed, isaText, printJsonReport, reportText } from '../../common/report';
import { optionalString, UsageError, type Verb, stringOptions } from '../../verb';
import { runCyclePoint } from '../../../engine/cycle/index';
import { cycleFileArgument, readDesignedCycle } from './readCycle';

function fraction(values: Readonly<Record<string, unknown>>, name: string): number | undefined {
  const text = optionalString(values, name);
  if (text === undefined) return undefined;
  const parsed = parseQuantity(text, 'dimensionless');
  if (!parsed.ok) throw new UsageError(`--${name}: ${parsed.error.message}`);
  return parsed.value;
}

function throttleOf(values: Readonly<Record<string, unknown>>): CycleThrottle {
  const rating = optionalString(values, 'rating');
  const fanSpeed = fraction(values, 'fan-speed');
  if ((rating === undefined) === (fanSpeed === undefined)) throw new UsageError('give one of --rating NAME or --fan-speed FRACTION');
  if (rating !== undefined) {
    const name = RATING_NAMES.find((r) => r === rating.trim());
    if (name === undefined) throw new UsageError(`--rating: "${rating}" is not a rating (${RATING_NAMES.join(', ')})`);
    return { kind: 'rating', rating: name as RatingName };
  }
  if (!(fanSpeed! > 0 && fanSpeed! <= 1.5)) throw new UsageError(`--fan-speed: ${fanSpeed} is outside (0, 1.5] of design`);
  return { kind: 'fanSpeed', fraction: fanSpeed! };
}

function requestOf(values: Readonly<Record<string, unknown>>): CyclePointRequest {
  const altitude_m = quantityOption(values, 'altitude', 'length', OPTION_RANGES.flightAltitude);
  const mach = quantityOption(values, 'mach', 'dimensionless', OPTION_RANGES.mach);
  const recovery = fraction(values, 'recovery');
  const bleedFraction = fraction(values, 'bleed');
  if (recovery !== undefined && !(recovery > 0 && recovery <= 1)) throw new UsageError(`--recovery: ${recovery} is outside (0, 1]`);
  if (bleedFraction !== undefined && !(bleedFraction >= 0 && bleedFraction < 0.3)) throw new UsageError(`--bleed: ${bleedFraction} is outside [0, 0.3) of core flow`);
  const powerExtraction_W = optionalQuantityOption(values, 'power-extraction', 'power', OPTION_RANGES.shaftPower);
  return {
    altitude_m,
    mach,
    isaDeviation_K: optionalQuantityOption(values, 'isa-dev', 'temperatureDelta', OPTION_RANGES.isaDeviation) ?? 0,
    throttle: throttleOf(values),
    ...(recovery === undefined ? {} : { recovery }),
    ...(bleedFraction === undefined ? {} : { bleedFraction }),
    ...(powerExtraction_W === undefined ? {} : { powerExtraction_W }),
  };
}

const r6 = (x: number): number => significant(x, 6);

function jsonOf(file: string, title: string, request: CyclePointRequest, p: CyclePointResult): Record<string, unknown> {
  return {
    file,
    engine: title,
    perEngine: true,
    altitude_m: request.altitude_m,
    mach: request.mach,
    isaDeviation_K: request.isaDeviation_K,
    throttle: request.throttle,
    status: p.status,
    message: p.message,
    residual: p.residual,
    iterations: p.iterations,
    evaluations: p.evaluations,
    thrust_N: p.thrust_N,
    fuelFlow_kg_s: p.fuelFlow_kg_s,
    airflow_kg_s: p.airflow_kg_s,
    tsfc_kg_N_s: p.tsfc_kg_N_s,
    fanSpeed: p.fanSpeed,
    fanCorrectedSpeed: p.fanCorrectedSpeed,
    coreSpeed: p.coreSpeed,
    turbineInletTemperature_K: p.turbineInletTemperature_K,
    bypassRatio: p.bypassRatio,
    fanPressureRatio: p.fanPressureRatio,
    overallPressureRatio: p.overallPressureRatio,
    activeLimit: p.activeLimit,
    exceededLimits: p.exceededLimits,
    cautions: p.cautions,
    recovery: p.recovery,
    bleedFraction: p.bleedFraction,
    powerExtraction_W: p.powerExtraction_W,
    stations: p.stations,
  };
}

function stationLines(rows: readonly StationRow[]): string[] {
  const head = `  ${'stn'.padEnd(4)} ${'station'.padEnd(27)} ${'flow kg/s'.padStart(10)} ${'Tt K'.padStart(8)} ${'Pt kPa'.padStart(9)}`;
  return [
    head,
    ...rows.map((r) => {
      const exit = r.velocity_m_s !== null && r.station !== '0' ? `   V ${r6(r.velocity_m_s)} m/s, M ${significant(r.mach ?? 0, 4)}, p ${r6((r.staticPressure_Pa ?? 0) / 1000)} kPa, A ${significant(r.area_m2 ?? 0, 5)} m2` : '';
      return `  ${r.station.padEnd(4)} ${r.name.padEnd(27)} ${r6(r.massFlow_kg_s).toString().padStart(10)} ${r6(r.totalTemperature_K).toString().padStart(8)} ${r6(r.totalPressure_Pa / 1000).toString().padStart(9)}${exit}`;
    }),
  ];
}

function textOf(title: string, request: CyclePointRequest, p: CyclePointResult): string {
  const t = request.throttle;
  const setting = t.kind === 'rating' ? `rating ${t.rating}` : t.kind === 'fanSpeed' ? `fan speed ${t.fraction} of design` : `Tt4 ${t.value_K} K`;
  const lbh = (kg_s: number): string => `${r6((kg_s / POUND_KG) * 3600)} lb/h`;
  const lines = [
    `${title} — per engine, cycle model`,
    `  at ${r6(request.altitude_m / FOOT_M)} ft (${r6(request.altitude_m)} m), Mach ${request.mach}, ${isaText(request.isaDeviation_K)}, ${setting}`,
    `  inlet recovery ${r6(p.recovery)}, bleed ${r6(p.bleedFraction * 100)} % of core flow, power extraction ${r6(p.powerExtraction_W / 1000)} kW`,
    `  status      ${p.status}: ${p.message} (residual ${p.residual === null ? 'n/a' : p.residual.toExponential(1)}, ${p.iterations} iterations)`,
    `  thrust      ${r6(p.thrust_N!)} N   ${r6(p.thrust_N! / POUND_FORCE_N)} lbf`,
    `  fuel flow   ${r6(p.fuelFlow_kg_s!)} kg/s   ${lbh(p.fuelFlow_kg_s!)}`,
    `  airflow     ${r6(p.airflow_kg_s!)} kg/s   ${r6(p.airflow_kg_s! / POUND_KG)} lb/s`,
    `  TSFC        ${p.tsfc_kg_N_s === null ? 'n/a (thrust not positive)' : `${r6(p.tsfc_kg_N_s * 1e6)} mg/(N s)   ${r6((p.tsfc_kg_N_s * 3600 * POUND_FORCE_N) / POUND_KG)} lb/(lbf h)`}`,
    `  fan speed   N1 ${r6(p.fanSpeed! * 100)} %, corrected ${r6(p.fanCorrectedSpeed! * 100)} % of design; core N2 ${r6(p.coreSpeed! * 100)} %`,
    `  Tt4         ${r6(p.turbineInletTemperature_K!)} K`,
    `  ratios      bypass ${r6(p.bypassRatio!)}, fan ${r6(p.fanPressureRatio!)}, overall ${r6(p.overallPressureRatio!)}`,
    `  limit       ${p.activeLimit ?? 'none (fixed setting)'}${p.exceededLimits.length ? `; exceeds the hard limits on ${p.exceededLimits.join(', ')}` : ''}`,
    ...p.cautions.map((c) => `  caution     ${c.code}: ${c.message}`),
    '',
    ...stationLines(p.stations),
  ];
  return reportText(lines);
}

export const cyclePointVerb: Verb = {
  name: 'cycle point',
  summary: 'run an engine cycle file at one flight condition and throttle',
  help: `blockwise cycle point — the matched engine cycle at one point (per engine)

Usage: blockwise cycle point <cycle-file> --altitude <altitude> --mach <mach>
                             (--rating NAME | --fan-speed FRACTION)
                             [--isa-dev <delta T>] [--recovery R] [--bleed FRACTION]
                             [--power-extraction POWER] [--json]

  <cycle-file>         a *.cycle.json file (docs/cycle-format.md)
  --altitude           pressure altitude with unit, e.g. "35000 ft" (bare number: m)
  --mach               flight Mach number
  --rating             a rating of the cycle file: ${RATING_NAMES.join(', ')}
  --fan-speed          mechanical fan (LP spool) speed N1 as a fraction of design, e.g. 0.9
  --isa-dev            ISA temperature deviation, e.g. "+15 K" (default 0)
  --recovery           inlet total-pressure recovery Pt2/Pt0 (default: the file's design value)
  --bleed              customer bleed off the compressor exit, fraction of core flow (default: design)
  --power-extraction   shaft power off the HP spool, e.g. "50 kW" (default: design)
  --json               print the result as JSON (thrust_N, fuelFlow_kg_s, airflow_kg_s, fanSpeed,
                       fanCorrectedSpeed, turbineInletTemperature_K, activeLimit, status, stations, ...)

Exit status: 0 when the engine matched; 3 when it did not (status and message
on stderr, or in the JSON); 1 for a cycle file that cannot be read or designed;
2 for a bad command line. Methods: docs/cycle.md.
`,
  options: {
    ...stringOptions('altitude', 'mach', 'rating', 'fan-speed', 'isa-dev', 'recovery', 'bleed', 'power-extraction'),
    json: { type: 'boolean' },
  },
  allowPositionals: true,
  run(values, positionals, io) {
    const file = cycleFileArgument(positionals);
    const request = requestOf(values);
    const engine = readDesignedCycle(file, 'cycle point', io);
    if (engine === null) return 1;
    const p = runCyclePoint(engine, request);
    if (values.json === true) {
      printJsonReport(io, jsonOf(file, engine.spec.title, request, p));
      return p.status === 'converged' ? 0 : 3;
    }
    if (p.status !== 'converged') return analysisFailed(io, 'cycle point', `${p.status}: ${p.message}`);
    io.out(textOf(engine.spec.title, request, p));
    return 0;
  },
};
