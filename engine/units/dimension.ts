/** The physical dimensions Blockwise parses and displays (SI inside). */
export type Dimension =
  | 'length'
  | 'speed'
  | 'mass'
  | 'force'
  | 'massFlow'
  | 'temperature'
  | 'temperatureDelta'
  | 'pressure'
  | 'time'
  | 'area'
  | 'power'
  | 'angle'
  | 'tsfc'
  | 'specificHeat'
  | 'specificEnergy'
  /** Specific range: distance flown per unit mass of fuel. */
  | 'specificRange'
  | 'dimensionless';

export type UnitSystem = 'si' | 'customary';

/** SI unit of each dimension, the unit a bare number is read in. */
export const SI_UNIT: Readonly<Record<Dimension, string>> = {
  length: 'm',
  speed: 'm/s',
  mass: 'kg',
  force: 'N',
  massFlow: 'kg/s',
  temperature: 'K',
  temperatureDelta: 'K',
  pressure: 'Pa',
  time: 's',
  area: 'm2',
  power: 'W',
  angle: 'rad',
  tsfc: 'kg/(N s)',
  specificHeat: 'J/(kg K)',
  specificEnergy: 'J/kg',
  specificRange: 'm/kg',
  dimensionless: '-',
};

/** How a dimension is named in messages ("a speed", "an area"). */
export const DIMENSION_PHRASE: Readonly<Record<Dimension, string>> = {
  length: 'a length',
  speed: 'a speed',
  mass: 'a mass',
  force: 'a force',
  massFlow: 'a mass flow',
  temperature: 'a temperature',
  temperatureDelta: 'a temperature difference',
  pressure: 'a pressure',
  time: 'a time',
  area: 'an area',
  power: 'a power',
  angle: 'an angle',
  tsfc: 'a thrust-specific fuel consumption',
  specificHeat: 'a specific heat',
  specificEnergy: 'a specific energy',
  specificRange: 'a specific range',
  dimensionless: 'a plain number',
};

/** Two examples per dimension for error messages. */
export const DIMENSION_EXAMPLES: Readonly<Record<Dimension, readonly [string, string]>> = {
  length: ['35000 ft', '10.67 km'],
  speed: ['250 kt', '128 m/s'],
  mass: ['45000 lb', '20400 kg'],
  force: ['26000 lbf', '120 kN'],
  massFlow: ['2400 lb/h', '0.6 kg/s'],
  temperature: ['-40 degC', '233.15 K'],
  temperatureDelta: ['+15 K', '10 degC'],
  pressure: ['101.3 kPa', '29.92 inHg'],
  time: ['45 min', '2700 s'],
  area: ['120 m2', '1290 ft2'],
  power: ['150 kW', '200 hp'],
  angle: ['3 deg', '0.05 rad'],
  tsfc: ['0.6 lb/(lbf h)', '17 mg/(N s)'],
  specificHeat: ['1004.5 J/(kg K)', '0.24 Btu/(lb degR)'],
  specificEnergy: ['42.8 MJ/kg', '18400 Btu/lb'],
  specificRange: ['75 nmi/(1000 lb)', '0.3 km/kg'],
  dimensionless: ['0.78', '2 %'],
};
