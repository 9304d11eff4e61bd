/**
 * The `*.blockwise.json` project file, current layout (version 3), as a zod 4
 * schema. Every physical field is a `quantity(dimension)`: a string with a
 * unit or a bare SI number; the parsed `Project` holds SI numbers under the
 * same field names (a field's unit is the SI unit of its dimension, see
 * docs/project-format.md). Cross-field rules live in projectChecks.ts.
 */
import * as z from 'zod';
import { quantity, ratio } from './quantityField';
import { uncertaintySchema } from './uncertaintySchema';
import { FOOT_M } from '../units/unitTable';

export const PROJECT_FORMAT = 'blockwise-project';
export const CURRENT_VERSION = 3;

const FT = FOOT_M;
/**
 * Pressure-altitude range a project file accepts for its altitudes: -2,000 ft
 * to 65,000 ft (common practice for the class). Named apart from the mission
 * input check's own range (engine/mission/missionInputCheck.ts, -1 km to 30 km,
 * which is wider at the top) so both can be re-exported from one index.
 */
export const PROJECT_MIN_ALTITUDE_M = -2000 * FT;
export const PROJECT_MAX_ALTITUDE_M = 65000 * FT;

function altitude() {
  return quantity('length', { min: PROJECT_MIN_ALTITUDE_M, max: PROJECT_MAX_ALTITUDE_M, what: 'a pressure altitude from -2,000 ft to 65,000 ft' });
}
function positiveQuantity(dimension: Parameters<typeof quantity>[0], what: string) {
  return quantity(dimension, { min: Number.MIN_VALUE, what });
}
function nonNegativeQuantity(dimension: Parameters<typeof quantity>[0], what: string) {
  return quantity(dimension, { min: 0, what });
}
/** An aircraft mass (OEW, MTOW, take-off weight...): above 0 and at most 1,000 t (several times the heaviest aircraft flown). */
function aircraftMass() {
  return quantity('mass', { min: Number.MIN_VALUE, max: 1e6, what: 'a mass above 0 and at most 1,000,000 kg' });
}
function payload() {
  return quantity('mass', { min: 0, max: 1e6, what: 'a mass from 0 to 1,000,000 kg' });
}
/** A calibrated airspeed of a schedule, a hold or VMO: above 0 and at most 400 m/s (778 kt). */
function airspeed() {
  return quantity('speed', { min: Number.MIN_VALUE, max: 400, what: 'a calibrated airspeed above 0 and at most 400 m/s (778 kt)' });
}
/** A leg's or a reserve's time: 0 to 48 h (far beyond any jet's endurance; the fuel runs out first). */
function duration() {
  return quantity('time', { min: 0, max: 48 * 3600, what: 'a time from 0 to 48 h' });
}
function subsonicMach() {
  return quantity('dimensionless', { min: 0.05, max: 0.99, what: 'a Mach number from 0.05 to 0.99' });
}
function mach() {
  return quantity('dimensionless', { min: 0, max: 5, what: 'a Mach number from 0 to 5' });
}
function fraction(what: string) {
  return quantity('dimensionless', { min: 0, max: 1, what });
}
function label() {
  return z.string().trim().min(1, { message: 'expected a non-empty name' });
}

// ---------------------------------------------------------------- airframe

export const weightsSchema = z.strictObject({
  operatingEmpty: aircraftMass(),
  maxZeroFuel: aircraftMass(),
  maxTakeoff: aircraftMass(),
  maxLanding: aircraftMass(),
  maxFuel: aircraftMass(),
});

export const airframeSchema = z.strictObject({
  /** Weights; the operating empty weight excludes the inlets (the active inlet's weight is added). */
  weights: weightsSchema,
  wingArea: positiveQuantity('area', 'an area > 0'),
  /** Maximum operating speed, CAS. */
  vmo: airspeed(),
  mmo: quantity('dimensionless', { min: 0.1, max: 5, what: 'a Mach number from 0.1 to 5' }),
});

// ---------------------------------------------------------------- polar

const cd0Row = z.strictObject({ mach: mach(), cd0: ratio() });
const kRow = z.strictObject({ mach: mach(), k: ratio() });
const clRow = z.strictObject({ mach: mach(), cl: ratio() });

export const polarSchema = z.strictObject({
  /** CD0 against Mach, rows `{ mach, cd0 }`. */
  cd0: z.array(cd0Row).min(1, { message: 'expected at least one { mach, cd0 } row' }),
  cdIncrement: ratio().default(0),
  induced: z.discriminatedUnion('kind', [
    z.strictObject({ kind: z.literal('oswald'), aspectRatio: ratio(), oswaldEfficiency: ratio() }),
    z.strictObject({ kind: z.literal('table'), rows: z.array(kRow).min(1) }),
  ]),
  clMinDrag: ratio().default(0),
  compressibility: z.discriminatedUnion('kind', [
    z.strictObject({ kind: z.literal('none') }),
    z.strictObject({
      kind: z.literal('korn'),
      sweep: quantity('angle'),
      thicknessRatio: ratio(),
      kornTechnologyFactor: ratio(),
    }),
    z.strictObject({
      kind: z.literal('table'),
      mach: z.array(mach()).min(1),
      cl: z.array(ratio()).min(1),
      /** cdWave[i][j] at mach[i], cl[j]. */
      cdWave: z.array(z.array(ratio())),
    }),
  ]),
  buffetCl: z.array(clRow).min(1, { message: 'expected at least one { mach, cl } row' }),
  clMax: z.array(clRow).min(1, { message: 'expected at least one { mach, cl } row' }),
});

// ---------------------------------------------------------------- engine

const ratingPowers = z.strictObject({
  takeoff: fraction('a power setting from 0 to 1').optional(),
  maxClimb: fraction('a power setting from 0 to 1').optional(),
  maxCruise: fraction('a power setting from 0 to 1').optional(),
  maxContinuous: fraction('a power setting from 0 to 1').optional(),
  flightIdle: fraction('a power setting from 0 to 1').optional(),
});

/** A deck generated from Mattingly's published thrust-lapse and TSFC models (engine/propulsion/parametricDeck.ts). */
export const parametricDeckSchema = z.strictObject({
  kind: z.literal('parametric'),
  model: z.enum(['highBypassTurbofan', 'lowBypassTurbofan', 'turbojet']),
  title: label(),
  seaLevelStaticThrust: positiveQuantity('force', 'a force > 0'),
  throttleRatio: quantity('dimensionless', { min: 0.9, max: 1.3, what: 'a throttle ratio from 0.9 to 1.3' }),
  seaLevelStaticTsfc: positiveQuantity('tsfc', 'a TSFC > 0'),
  seaLevelStaticAirflow: positiveQuantity('massFlow', 'a mass flow > 0'),
  /** Ratings on the power axis (fraction of full-throttle thrust); the parametric defaults when absent. */
  ratings: ratingPowers.optional(),
  partPowerFuelIntercept: quantity('dimensionless', { min: 0, max: 0.5, what: 'a fuel-flow intercept from 0 to 0.5' }).optional(),
  /** Tabulation grid; a built-in grid (0 to 51,000 ft, Mach 0 to 0.9) when absent. */
  grid: z
    .strictObject({
      altitudes: z.array(altitude()).min(2),
      machs: z.array(mach()).min(2),
      powers: z.array(quantity('dimensionless', { min: 1e-6, max: 1, what: 'a power setting in (0, 1]' })).min(2),
    })
    .optional(),
});

/** An engine cycle file (docs/cycle-format.md): the deck is generated from it, with installation sensitivities. */
export const cycleDeckSchema = z.strictObject({
  kind: z.literal('cycle'),
  /** The *.cycle.json file, relative to the project file's folder. */
  path: label(),
  /** Tabulation grid of the generated deck; the built-in grid (0 to 51,000 ft, Mach 0 to 0.9, ISA) when absent. */
  grid: z
    .strictObject({
      altitudes: z.array(altitude()).min(2),
      machs: z.array(mach()).min(2),
      isaDeviations: z.array(quantity('temperatureDelta', { min: -80, max: 80, what: 'an ISA deviation from -80 K to +80 K' })).min(2).optional(),
    })
    .optional(),
});

export const deckSourceSchema = z.discriminatedUnion('kind', [
  /**
   * A deck file (CSV or JSON, told apart by content), relative to the project
   * file's folder; `text`, when present, is that file's text saved inside the
   * project, read instead of the file (docs/project-format.md).
   */
  z.strictObject({ kind: z.literal('file'), path: label(), text: z.string().min(1, { message: 'expected the deck file\'s text' }).optional() }),
  cycleDeckSchema,
  /** A deck in the JSON deck format (docs/deck-format.md), inline. */
  z.strictObject({ kind: z.literal('embedded'), deck: z.record(z.string(), z.unknown()) }),
  parametricDeckSchema,
]);

export const installationSchema = z.strictObject({
  /**
   * How the inlet's recovery (and bleed and extraction) act on the deck:
   * Raymer's rule with C_ram, or the deck's own sensitivity columns (a
   * cycle-generated deck carries them from the cycle); absent = the deck's
   * sensitivities when it has them, else Raymer's rule.
   */
  recoveryMethod: z.enum(['raymer', 'deckSensitivities']).optional(),
  /** Fuel flow under Raymer's ram-recovery correction: held at the power setting (default) or scaled with recovery (corrected-flow engine). */
  ramFuelFlow: z.enum(['heldAtPower', 'scaledWithRecovery']).optional(),
  /** Raymer's supersonic form of C_ram above Mach 1 (C_ram - 0.15 (M - 1)); default true. */
  ramSupersonicForm: z.boolean().optional(),
  /** Customer bleed per engine: a fraction of core flow, or a mass flow with the core's share of deck airflow. */
  bleed: z
    .discriminatedUnion('kind', [
      z.strictObject({ kind: z.literal('coreFraction'), fraction: fraction('a fraction of core flow from 0 to 1') }),
      z.strictObject({
        kind: z.literal('massFlow'),
        massFlow: nonNegativeQuantity('massFlow', 'a mass flow >= 0'),
        coreFlowFraction: quantity('dimensionless', { min: 0.01, max: 1, what: 'a fraction from 0.01 to 1' }),
      }),
    ])
    .default({ kind: 'coreFraction', fraction: 0 }),
  /** Shaft power extraction per engine. */
  powerExtraction: nonNegativeQuantity('power', 'a power >= 0').default(0),
  /** Raymer's ram-recovery correction coefficient C_ram; the propulsion default when absent. */
  ramRecoveryFactor: nonNegativeQuantity('dimensionless', 'a number >= 0').optional(),
  /** Raymer's bleed correction coefficient C_bleed; the propulsion default when absent. */
  bleedFactor: nonNegativeQuantity('dimensionless', 'a number >= 0').optional(),
});

export const engineSchema = z.strictObject({
  count: z.number().int({ message: 'expected a whole number of engines' }).min(1).max(8),
  deck: deckSourceSchema,
  /**
   * What the deck is interpolated in: corrected parameters (F/delta,
   * Wf/(delta sqrt(theta)), W sqrt(theta)/delta over pressure altitude and
   * Mach; default) or the raw tabulated values (docs/deck-format.md).
   */
  deckInterpolation: z.enum(['corrected', 'raw']).optional(),
  installation: installationSchema.default({ bleed: { kind: 'coreFraction', fraction: 0 }, powerExtraction: 0 }),
});

// ---------------------------------------------------------------- inlets

export const inletSchema = z.strictObject({
  name: label(),
  description: z.string().default(''),
  source: z.discriminatedUnion('kind', [
    z.strictObject({
      kind: z.literal('recoveryTable'),
      captureArea: positiveQuantity('area', 'an area > 0'),
      /** Recovery against flight Mach, rows `{ mach, recovery }`. */
      rows: z.array(z.strictObject({ mach: mach(), recovery: fraction('a recovery from 0 to 1') })).min(1),
    }),
    z.strictObject({
      kind: z.literal('geometry'),
      captureArea: positiveQuantity('area', 'an area > 0'),
      throatArea: positiveQuantity('area', 'an area > 0'),
      fanFaceArea: positiveQuantity('area', 'an area > 0'),
      diffuserLossCoefficient: nonNegativeQuantity('dimensionless', 'a number >= 0'),
    }),
  ]),
  /** One lip-suction fraction at every Mach and mass-flow ratio; give this or `lipSuction`, or neither for the rounded-pitot default. */
  lipSuctionFactor: fraction('a fraction from 0 to 1').optional(),
  /** Lip suction over flight Mach and mass-flow ratio (engine/propulsion/lipSuction.ts); absent with no factor: the rounded subsonic pitot lip. */
  lipSuction: z
    .discriminatedUnion('kind', [
      z.strictObject({ kind: z.literal('roundedPitot') }),
      z.strictObject({
        kind: z.literal('table'),
        mach: z.array(mach()).min(1),
        massFlowRatio: z.array(quantity('dimensionless', { min: 0, max: 1.5, what: 'a mass-flow ratio from 0 to 1.5' })).min(1),
        /** factor[i][j] at mach[i], massFlowRatio[j]. */
        factor: z.array(z.array(fraction('a fraction from 0 to 1')).min(1)).min(1),
      }),
    ])
    .optional(),
  /** External (nacelle/inlet) drag area D/q per engine. */
  externalDragArea: nonNegativeQuantity('area', 'an area >= 0'),
  /** Weight per engine, added to the operating empty weight. */
  weight: nonNegativeQuantity('mass', 'a mass >= 0'),
});

// ---------------------------------------------------------------- mission

const environment = {
  name: label().optional(),
  isaDeviation: quantity('temperatureDelta', { min: -80, max: 80, what: 'an ISA deviation from -80 K to +80 K' }).optional(),
  /** Along-track wind: positive tailwind, negative headwind. */
  wind: quantity('speed', { min: -150, max: 150, what: 'a wind from -150 m/s to +150 m/s' }).optional(),
};

export const speedScheduleSchema = z.strictObject({
  lowCas: airspeed(),
  lowAltitudeLimit: altitude(),
  cas: airspeed(),
  mach: subsonicMach(),
});

const allowanceFuelFlow = z.union([z.literal('idle'), nonNegativeQuantity('massFlow', 'a mass flow >= 0')]);

/** Holding speed: best endurance (optionally a factor on the minimum-drag speed, never below a minimum CAS) or a set CAS. */
export const holdSpeedSchema = z.discriminatedUnion('kind', [
  z.strictObject({
    kind: z.literal('bestEndurance'),
    minCas: nonNegativeQuantity('speed', 'a speed >= 0').optional(),
    speedFactor: quantity('dimensionless', { min: 1, max: 2, what: 'a factor from 1 to 2 on the minimum-drag speed' }).optional(),
  }),
  z.strictObject({ kind: z.literal('cas'), cas: airspeed() }),
]);

export const legSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('taxiOut'), ...environment, time: duration(), fuelFlow: allowanceFuelFlow }),
  z.strictObject({
    kind: z.literal('takeoff'),
    ...environment,
    time: duration(),
    /** A fuel allowance, or null/absent for time at the takeoff rating. */
    fuel: nonNegativeQuantity('mass', 'a mass >= 0').nullable().default(null),
  }),
  z.strictObject({
    kind: z.literal('climb'),
    ...environment,
    toAltitude: altitude(),
    schedule: speedScheduleSchema,
    rating: z.enum(['takeoff', 'maxClimb', 'maxCruise', 'maxContinuous', 'flightIdle']).default('maxClimb'),
  }),
  z.strictObject({
    kind: z.literal('cruise'),
    ...environment,
    altitude: altitude(),
    speed: z.discriminatedUnion('kind', [
      z.strictObject({ kind: z.literal('mach'), mach: subsonicMach() }),
      z.strictObject({ kind: z.literal('bestRange') }),
      z.strictObject({ kind: z.literal('longRange') }),
    ]),
    profile: z
      .discriminatedUnion('kind', [
        z.strictObject({ kind: z.literal('constantAltitude') }),
        z.strictObject({ kind: z.literal('stepClimb'), step: positiveQuantity('length', 'a length > 0'), maxAltitude: altitude() }),
        z.strictObject({ kind: z.literal('cruiseClimb'), maxAltitude: altitude() }),
      ])
      .default({ kind: 'constantAltitude' }),
    /** Distance (over the ground, or in still air when mission.distanceBasis is "stillAir"), or "solve" for the leg whose distance meets the mission range. */
    distance: z.union([z.literal('solve'), nonNegativeQuantity('length', 'a length >= 0')]),
  }),
  z.strictObject({
    kind: z.literal('descent'),
    ...environment,
    toAltitude: altitude(),
    schedule: speedScheduleSchema,
    mode: z
      .discriminatedUnion('kind', [
        z.strictObject({ kind: z.literal('idle') }),
        z.strictObject({ kind: z.literal('rate'), rate: quantity('speed', { min: Number.MIN_VALUE, max: 100, what: 'a descent rate above 0 and at most 100 m/s (19,685 ft/min)' }) }),
      ])
      .default({ kind: 'idle' }),
  }),
  z.strictObject({
    kind: z.literal('hold'),
    ...environment,
    altitude: altitude(),
    time: duration(),
    speed: holdSpeedSchema.default({ kind: 'bestEndurance' }),
  }),
  z.strictObject({
    kind: z.literal('approach'),
    ...environment,
    time: duration(),
    fuel: nonNegativeQuantity('mass', 'a mass >= 0').nullable().default(null),
  }),
  z.strictObject({ kind: z.literal('taxiIn'), ...environment, time: duration(), fuelFlow: allowanceFuelFlow }),
]);

export const alternateSchema = z.strictObject({
  distance: positiveQuantity('length', 'a length > 0'),
  cruiseAltitude: altitude(),
  cruiseMach: subsonicMach(),
  elevation: altitude().default(0),
  /** Along-track wind on the way to the alternate (+ tailwind); absent = the mission's wind. */
  wind: quantity('speed', { min: -150, max: 150, what: 'a wind from -150 m/s to +150 m/s' }).optional(),
});

/** An allowance in the reserves: a time, and a set fuel or null for the time at the allowance's rating. */
const reserveAllowanceSchema = z.strictObject({
  time: duration(),
  fuel: nonNegativeQuantity('mass', 'a mass >= 0').nullable().default(null),
});

/** Settings all presets share (optional; absent = the defaults in engine/mission/reserveRules.ts). */
const reserveCommon = {
  /** Missed approach at the destination and approach and landing at the alternate. */
  arrival: z.strictObject({ missedApproach: reserveAllowanceSchema, alternateApproach: reserveAllowanceSchema }).optional(),
  /** Speed of the contingency and final-reserve holds. */
  holdSpeed: holdSpeedSchema.optional(),
};

export const reservesSchema = z.discriminatedUnion('preset', [
  z.strictObject({
    preset: z.literal('icaoAnnex6'),
    ...reserveCommon,
    contingencyFraction: fraction('a fraction from 0 to 1').default(0.05),
    minContingencyTime: duration().default(300),
    alternate: alternateSchema.nullable(),
    finalReserveTime: duration().default(1800),
  }),
  z.strictObject({
    preset: z.literal('cfr121_639'),
    ...reserveCommon,
    alternate: alternateSchema.nullable(),
    finalReserveTime: duration().default(2700),
  }),
  z.strictObject({
    preset: z.literal('cfr121_645'),
    ...reserveCommon,
    enRouteFraction: fraction('a fraction from 0 to 1').default(0.1),
    alternate: alternateSchema.nullable(),
    finalReserveTime: duration().default(1800),
  }),
  z.strictObject({
    preset: z.literal('custom'),
    ...reserveCommon,
    contingencyFraction: fraction('a fraction from 0 to 1'),
    alternate: alternateSchema.nullable(),
    finalReserveTime: duration(),
    extraFuel: nonNegativeQuantity('mass', 'a mass >= 0').default(0),
  }),
]);

export const solveSchema = z.discriminatedUnion('mode', [
  z.strictObject({
    mode: z.literal('takeoffWeight'),
    takeoffWeight: aircraftMass(),
    payload: payload(),
  }),
  z.strictObject({
    mode: z.literal('payloadRange'),
    payload: payload(),
    range: quantity('length', { min: Number.MIN_VALUE, max: 4.0075e7, what: 'a range above 0 and at most 40,075 km' }),
  }),
  z.strictObject({ mode: z.literal('maxRange'), payload: payload() }),
]);

export const missionSchema = z.strictObject({
  isaDeviation: quantity('temperatureDelta', { min: -80, max: 80, what: 'an ISA deviation from -80 K to +80 K' }).default(0),
  wind: quantity('speed', { min: -150, max: 150, what: 'a wind from -150 m/s to +150 m/s' }).default(0),
  /** Elevation of the destination aerodrome; absent = 0 ft. The last descent ends 1,500 ft above it (common practice). */
  destinationElevation: altitude().optional(),
  /**
   * What the range, set cruise distances and the alternate's distance measure: "ground" (between aerodromes; the
   * wind changes air distance, fuel and time) or "stillAir" (a design-range study; every result says so).
   */
  distanceBasis: z.enum(['ground', 'stillAir']).default('ground'),
  legs: z.array(legSchema).min(1, { message: 'expected at least one leg' }),
  reserves: reservesSchema,
  solve: solveSchema,
});

// ---------------------------------------------------------------- cautions

/** Threshold overrides; absent fields take DEFAULT_CAUTION_SETTINGS. */
export const cautionsSchema = z.strictObject({
  minResidualClimbRate: quantity('speed', { min: 0, max: 50, what: 'a climb rate from 0 to 50 m/s (9,843 ft/min)' }).optional(),
  minBuffetLoadFactor: quantity('dimensionless', { min: 1, max: 3, what: 'a load factor from 1 to 3' }).optional(),
  vmoMargin: quantity('speed', { min: 0, max: 100, what: 'a speed margin from 0 to 100 m/s' }).optional(),
  mmoMargin: fraction('a Mach margin from 0 to 1').optional(),
  minReserveFraction: quantity('dimensionless', { min: 0, max: 10, what: 'a fraction of the reserve from 0 to 10' }).optional(),
  cautionOnDeckExtrapolation: z.boolean().optional(),
  maxThroatMach: fraction('a Mach number from 0 to 1').optional(),
  minFanFaceMach: fraction('a Mach number from 0 to 1').optional(),
  maxFanFaceMach: fraction('a Mach number from 0 to 1').optional(),
  /** Largest spillage drag as a share of the engine's thrust before the caution spillage_share_high (default 5 %). */
  maxSpillageShare: fraction('a share from 0 to 1').optional(),
});

// ---------------------------------------------------------------- project

export const projectSchema = z.strictObject({
  format: z.literal(PROJECT_FORMAT),
  version: z.literal(CURRENT_VERSION),
  name: label(),
  notes: z.string().default(''),
  airframe: airframeSchema,
  polar: polarSchema,
  engine: engineSchema,
  inlets: z.array(inletSchema).min(1, { message: 'expected at least one inlet design' }),
  activeInlet: label(),
  mission: missionSchema,
  cautions: cautionsSchema.default({}),
  /** Inputs declared uncertain and the Monte-Carlo settings (engine/uncertainty); absent = none declared. */
  uncertainty: uncertaintySchema.optional(),
});

/** A parsed project: SI numbers throughout (see docs/project-format.md for each field's dimension). */
export type Project = z.output<typeof projectSchema>;
/** The file form before parsing (quantities as numbers or unit strings). */
export type ProjectFile = z.input<typeof projectSchema>;
export type ProjectLeg = Project['mission']['legs'][number];
export type ProjectInlet = Project['inlets'][number];
