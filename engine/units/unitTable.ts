/**
 * Every unit Blockwise accepts and its exact conversion to SI. The ONE place
 * conversion factors live (docs/style.md §6). SI value = value * scale + offset.
 *
 * Factors are the exact definitions of NIST Special Publication 811 (2008),
 * Appendix B, unless noted: the international foot and pound (1959), the
 * international nautical mile, standard gravity g0 = 9.80665 m/s^2
 * (3rd CGPM 1901) for pound-force and kilogram-force.
 */
import type { Dimension } from './dimension';

export interface UnitDef {
  readonly dimension: Dimension;
  readonly scale: number;
  /** Added after scaling; non-zero only for absolute temperatures. */
  readonly offset: number;
}

/** International foot, exact (NIST SP 811, B.8). */
export const FOOT_M = 0.3048;
/** International inch, exact (NIST SP 811, B.8). */
export const INCH_M = 0.0254;
/** International nautical mile, exact (NIST SP 811, B.8). */
export const NAUTICAL_MILE_M = 1852;
/** International (statute) mile, exact (NIST SP 811, B.8). */
export const MILE_M = 1609.344;
/** Avoirdupois pound, exact (NIST SP 811, B.8). */
export const POUND_KG = 0.45359237;
/** Standard acceleration of gravity, exact (3rd CGPM 1901; NIST SP 811, B.8). */
export const STANDARD_GRAVITY_M_S2 = 9.80665;
/** Pound-force = pound x g0, exact; 4.4482216152605 N (NIST SP 811, B.8). */
export const POUND_FORCE_N = POUND_KG * STANDARD_GRAVITY_M_S2;
/** Knot = 1 nmi/h, exact (NIST SP 811, B.8). */
export const KNOT_M_S = NAUTICAL_MILE_M / 3600;
/** Inch of mercury, conventional, at 0 degC: 3386.389 Pa (NIST SP 811, B.8). */
export const INCH_HG_PA = 3386.389;
/** Millimetre of mercury, conventional: 133.3224 Pa (NIST SP 811, B.8). */
export const MM_HG_PA = 133.3224;
/** Mechanical horsepower = 550 ft lbf/s = 745.69987... W (NIST SP 811, B.8). */
export const HORSEPOWER_W = 550 * FOOT_M * POUND_FORCE_N;
/** British thermal unit (International Table), exact: 1055.05585262 J (NIST SP 811, B.8). */
export const BTU_IT_J = 1055.05585262;
/** Standard atmosphere, exact (NIST SP 811, B.8). */
export const ATMOSPHERE_PA = 101325;

function u(dimension: Dimension, scale: number, offset = 0): UnitDef {
  return { dimension, scale, offset };
}

/**
 * Accepted unit spellings, keyed by their normalized form (see
 * normalizeUnit). Case-sensitive: "Pa" and "PA" differ, as in SI usage.
 */
export const UNIT_TABLE: Readonly<Record<string, UnitDef>> = {
  // length
  m: u('length', 1),
  km: u('length', 1000),
  cm: u('length', 0.01),
  mm: u('length', 0.001),
  ft: u('length', FOOT_M),
  in: u('length', INCH_M),
  nmi: u('length', NAUTICAL_MILE_M),
  NM: u('length', NAUTICAL_MILE_M),
  mi: u('length', MILE_M),
  // speed
  'm/s': u('speed', 1),
  'km/h': u('speed', 1000 / 3600),
  kt: u('speed', KNOT_M_S),
  kts: u('speed', KNOT_M_S),
  kn: u('speed', KNOT_M_S),
  mph: u('speed', MILE_M / 3600),
  'ft/min': u('speed', FOOT_M / 60),
  fpm: u('speed', FOOT_M / 60),
  'ft/s': u('speed', FOOT_M),
  'm/min': u('speed', 1 / 60),
  // mass
  kg: u('mass', 1),
  g: u('mass', 0.001),
  t: u('mass', 1000),
  lb: u('mass', POUND_KG),
  lbm: u('mass', POUND_KG),
  // force
  N: u('force', 1),
  kN: u('force', 1000),
  daN: u('force', 10),
  MN: u('force', 1e6),
  lbf: u('force', POUND_FORCE_N),
  kgf: u('force', STANDARD_GRAVITY_M_S2),
  // mass flow
  'kg/s': u('massFlow', 1),
  'kg/min': u('massFlow', 1 / 60),
  'kg/h': u('massFlow', 1 / 3600),
  't/h': u('massFlow', 1000 / 3600),
  'lb/s': u('massFlow', POUND_KG),
  'lb/min': u('massFlow', POUND_KG / 60),
  'lb/h': u('massFlow', POUND_KG / 3600),
  'lbm/s': u('massFlow', POUND_KG),
  'lbm/h': u('massFlow', POUND_KG / 3600),
  // absolute temperature (as a temperature difference only the scale applies)
  K: u('temperature', 1),
  degC: u('temperature', 1, 273.15),
  '°C': u('temperature', 1, 273.15),
  degF: u('temperature', 5 / 9, 459.67 * (5 / 9)),
  '°F': u('temperature', 5 / 9, 459.67 * (5 / 9)),
  degR: u('temperature', 5 / 9),
  '°R': u('temperature', 5 / 9),
  // pressure
  Pa: u('pressure', 1),
  hPa: u('pressure', 100),
  kPa: u('pressure', 1000),
  MPa: u('pressure', 1e6),
  mbar: u('pressure', 100),
  bar: u('pressure', 1e5),
  psi: u('pressure', POUND_FORCE_N / (INCH_M * INCH_M)),
  psf: u('pressure', POUND_FORCE_N / (FOOT_M * FOOT_M)),
  inHg: u('pressure', INCH_HG_PA),
  mmHg: u('pressure', MM_HG_PA),
  atm: u('pressure', ATMOSPHERE_PA),
  // specific range (distance per fuel mass); 1000 lb is a count of pounds, exact as the pound is
  'm/kg': u('specificRange', 1),
  'km/kg': u('specificRange', 1000),
  'nmi/kg': u('specificRange', NAUTICAL_MILE_M),
  'nmi/lb': u('specificRange', NAUTICAL_MILE_M / POUND_KG),
  'nmi/(1000 lb)': u('specificRange', NAUTICAL_MILE_M / (1000 * POUND_KG)),
  'NM/(1000 lb)': u('specificRange', NAUTICAL_MILE_M / (1000 * POUND_KG)),
  // time
  s: u('time', 1),
  min: u('time', 60),
  h: u('time', 3600),
  // area
  m2: u('area', 1),
  'm^2': u('area', 1),
  cm2: u('area', 1e-4),
  'cm^2': u('area', 1e-4),
  ft2: u('area', FOOT_M * FOOT_M),
  'ft^2': u('area', FOOT_M * FOOT_M),
  in2: u('area', INCH_M * INCH_M),
  'in^2': u('area', INCH_M * INCH_M),
  // power
  W: u('power', 1),
  kW: u('power', 1000),
  MW: u('power', 1e6),
  hp: u('power', HORSEPOWER_W),
  // angle
  rad: u('angle', 1),
  deg: u('angle', Math.PI / 180),
  '°': u('angle', Math.PI / 180),
  // thrust-specific fuel consumption, SI kg/(N s)
  'kg/(N s)': u('tsfc', 1),
  'kg/(N h)': u('tsfc', 1 / 3600),
  'kg/(daN h)': u('tsfc', 1 / 36000),
  'mg/(N s)': u('tsfc', 1e-6),
  'g/(kN s)': u('tsfc', 1e-6),
  'lb/(lbf h)': u('tsfc', POUND_KG / (POUND_FORCE_N * 3600)),
  'lbm/(lbf h)': u('tsfc', POUND_KG / (POUND_FORCE_N * 3600)),
  'lb/lbf/h': u('tsfc', POUND_KG / (POUND_FORCE_N * 3600)),
  // fuel weight flow per unit thrust (weight = mass x g0); 1/h equals lb/(lbf h) exactly
  '1/h': u('tsfc', 1 / (STANDARD_GRAVITY_M_S2 * 3600)),
  '1/s': u('tsfc', 1 / STANDARD_GRAVITY_M_S2),
  // specific heat (cycle gas properties); Btu(IT)/(lb degR) = 4186.8 J/(kg K) exactly
  'J/(kg K)': u('specificHeat', 1),
  'kJ/(kg K)': u('specificHeat', 1000),
  'Btu/(lb degR)': u('specificHeat', BTU_IT_J / (POUND_KG * (5 / 9))),
  // specific energy (fuel heating value); Btu(IT)/lb = 2326 J/kg exactly
  'J/kg': u('specificEnergy', 1),
  'kJ/kg': u('specificEnergy', 1000),
  'MJ/kg': u('specificEnergy', 1e6),
  'Btu/lb': u('specificEnergy', BTU_IT_J / POUND_KG),
  // dimensionless
  '-': u('dimensionless', 1),
  '%': u('dimensionless', 0.01),
};

/**
 * Normalizes a unit's spelling: trims, reads "·" and "*" as a space,
 * collapses runs of spaces and drops spaces next to "/", "(", ")" and "^".
 * "lb / (lbf·h)" becomes "lb/(lbf h)".
 */
export function normalizeUnit(unit: string): string {
  return unit
    .replace(/[\u00b7*]/g, ' ') // · (middle dot) or *, escaped so the CLI bundle stays ASCII (bin/cliCodeCache.mjs)
    .replace(/\s+/g, ' ')
    .trim()
    .replace(/\s*([/()^])\s*/g, '$1');
}

/** The definition of a unit spelling, or undefined when it is not accepted. */
export function lookupUnit(unit: string): UnitDef | undefined {
  const key = normalizeUnit(unit);
  return Object.prototype.hasOwnProperty.call(UNIT_TABLE, key) ? UNIT_TABLE[key] : undefined;
}

/** Accepted spellings of one dimension, in table order (for docs and messages). */
export function unitsOf(dimension: Dimension): readonly string[] {
  return Object.keys(UNIT_TABLE).filter((k) => UNIT_TABLE[k].dimension === dimension);
}
