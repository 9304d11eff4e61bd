import { type Airspeeds, airspeedsAt, atmosphere, type AtmosphereState, type SpeedInput } from '../../engine/aero';
import { type DisplayKind, FOOT_M, formatQuantity, fromSi, groupDigits, POUND_KG } from '../../engine/units';
import { OPTION_RANGES, optionalQuantityOption, quantityOption } from '../common/quantityOptions';

/** The standard atmosphere's own ISA-deviation range (engine/aero/standardAtmosphere.ts). */
const AIR_ISA_DEV = { min: -100, max: 100, what: 'an ISA deviation from -100 K to +100 K' };
import { printJsonReport, reportText } from '../common/report';
import { optionalString, UsageError, type CliIo, type Verb, stringOptions } from '../verb';
import { verbSummary } from './catalogue';

const SPEED_OPTIONS = ['cas', 'eas', 'tas', 'mach'] as const;

function readSpeed(values: Readonly<Record<string, unknown>>): SpeedInput | null {
  const given = SPEED_OPTIONS.filter((n) => optionalString(values, n) !== undefined);
  if (given.length > 1) {
    throw new UsageError(`give one speed, not ${given.map((n) => `--${n}`).join(' and ')}`);
  }
  const name = given[0];
  if (name === undefined) return null;
  const value = name === 'mach' ? optionalQuantityOption(values, name, 'dimensionless', OPTION_RANGES.mach)! : optionalQuantityOption(values, name, 'speed', OPTION_RANGES.airspeed)!;
  if (value < 0) throw new UsageError(`--${name}: a speed cannot be negative (got ${String(values[name])})`);
  if (name === 'cas') return { cas_m_s: value };
  if (name === 'eas') return { eas_m_s: value };
  if (name === 'tas') return { tas_m_s: value };
  return { mach: value };
}

function row(label: string, si: string, customary: string): string {
  return `  ${label.padEnd(26)}${si.padStart(16)}  ${customary.padStart(16)}`;
}

function quantityRow(label: string, value_si: number, kind: DisplayKind, siDigits?: number, customaryDigits?: number): string {
  return row(label, formatQuantity(value_si, kind, 'si', siDigits), formatQuantity(value_si, kind, 'customary', customaryDigits));
}

function plainRow(label: string, value: number, digits: number): string {
  const text = groupDigits(value, digits);
  return row(label, text, text);
}

function textReport(state: AtmosphereState, speeds: Airspeeds | null): string {
  const lines = [
    `Standard atmosphere at ${formatQuantity(state.pressureAltitude_m, 'altitude', 'customary')} pressure altitude, ISA${state.isaDev_K >= 0 ? '+' : ''}${groupDigits(state.isaDev_K, 1)} K`,
    '',
    row('', 'SI', 'customary'),
    quantityRow('pressure altitude', state.pressureAltitude_m, 'altitude', 1, 0),
    quantityRow('temperature', state.temperature_K, 'temperature'),
    quantityRow('ISA temperature', state.isaTemperature_K, 'temperature'),
    row('pressure', `${groupDigits(state.pressure_Pa, 0)} Pa`, formatQuantity(state.pressure_Pa, 'pressure', 'customary')),
    row('density', `${state.density_kg_m3.toFixed(5)} kg/m3`, `${((state.density_kg_m3 * FOOT_M ** 3) / POUND_KG).toFixed(5)} lb/ft3`),
    quantityRow('speed of sound', state.speedOfSound_m_s, 'speed', 2, 1),
    plainRow('theta = T/T0', state.theta, 5),
    plainRow('delta = p/p0', state.delta, 5),
    plainRow('sigma = rho/rho0', state.sigma, 5),
  ];
  if (speeds !== null) {
    lines.push(
      plainRow('Mach', speeds.mach, 4),
      quantityRow('CAS', speeds.cas_m_s, 'speed', 2, 1),
      quantityRow('EAS', speeds.eas_m_s, 'speed', 2, 1),
      quantityRow('TAS', speeds.tas_m_s, 'speed', 2, 1),
      row('dynamic pressure', `${groupDigits(speeds.dynamicPressure_Pa, 0)} Pa`, `${groupDigits(fromSi(speeds.dynamicPressure_Pa, 'psf'), 1)} psf`),
      row('impact pressure', `${groupDigits(speeds.impactPressure_Pa, 0)} Pa`, `${groupDigits(fromSi(speeds.impactPressure_Pa, 'psf'), 1)} psf`),
    );
  }
  return reportText(lines);
}

export const airVerb: Verb = {
  name: 'air',
  summary: verbSummary('air'),
  help: `blockwise air — standard atmosphere (U.S. Standard Atmosphere 1976) and airspeeds

Usage: blockwise air --altitude <length> [--isa-dev <temperature difference>]
                     [--cas <speed> | --eas <speed> | --tas <speed> | --mach <number>] [--json]

Options:
  --altitude   pressure altitude, e.g. "35000 ft", "10.67 km" (bare number = m); -5,004 m to 71,000 m
  --isa-dev    temperature deviation from ISA, e.g. "+15 K", --isa-dev=-10degC (bare number = K);
               -100 K to +100 K, default 0
  --cas        calibrated airspeed, e.g. "250 kt", "128 m/s" (bare number = m/s)
  --eas        equivalent airspeed
  --tas        true airspeed
  --mach       Mach number, e.g. 0.78
  --json       print JSON (SI units, names carry the unit)

Units are listed in docs/units.md. Give at most one speed. A value starting
with a minus sign needs an equals sign: --isa-dev=-10K, --altitude=-1000ft.
`,
  options: {
    ...stringOptions('altitude', 'isa-dev', 'cas', 'eas', 'tas', 'mach'),
    json: { type: 'boolean' },
  },
  run(values, _positionals, io: CliIo): number {
    const altitude_m = quantityOption(values, 'altitude', 'length', OPTION_RANGES.atmosphereAltitude);
    const isaDev_K = optionalQuantityOption(values, 'isa-dev', 'temperatureDelta', AIR_ISA_DEV) ?? 0;
    const speed = readSpeed(values);
    const state = atmosphere(altitude_m, isaDev_K);
    if (!state.ok) {
      const option = state.error.code === 'isa_dev_out_of_range' ? '--isa-dev' : '--altitude';
      throw new UsageError(`${option}: ${state.error.message}`);
    }
    let speeds: Airspeeds | null = null;
    if (speed !== null) {
      const result = airspeedsAt(state.value, speed);
      if (!result.ok) throw new UsageError(result.error.message);
      speeds = result.value;
    }
    if (values.json === true) {
      const s = state.value;
      printJsonReport(io, {
        pressureAltitude_m: s.pressureAltitude_m,
        isaDev_K: s.isaDev_K,
        temperature_K: s.temperature_K,
        isaTemperature_K: s.isaTemperature_K,
        pressure_Pa: s.pressure_Pa,
        density_kg_m3: s.density_kg_m3,
        speedOfSound_m_s: s.speedOfSound_m_s,
        theta: s.theta,
        delta: s.delta,
        sigma: s.sigma,
        ...(speeds === null ? {} : speeds),
      });
    } else {
      io.out(textReport(state.value, speeds));
    }
    return 0;
  },
};
