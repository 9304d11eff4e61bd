/**
 * The reserve presets as the published rules word them: for each preset the
 * rule's text (quoted from memory; check the current edition before relying
 * on it), the items Blockwise flies for it, and where the flying is an
 * interpretation of the words rather than the words themselves. The leg rows
 * of a result are named from this table, and the app shows it beside the
 * preset, so the interpretation is never hidden.
 *
 * Defaults of the settings every preset shares (ReserveCommon):
 * - missed approach at the destination before the alternate: the mission's
 *   take-off allowance (a go-around costs about a take-off; common practice),
 *   else 1 min at the takeoff rating;
 * - approach and landing at the alternate: the mission's approach allowance
 *   (common practice), else 5 min at the flightIdle fuel flow at Mach 0.2;
 * - holds (contingency minimum, final reserve): best endurance flown at 1.1 x
 *   the minimum-drag speed, on the speed-stable side of the drag curve
 *   (common practice, the factor from memory), no minimum CAS.
 */
import type { HoldSpeed, MissionInput, ReserveAllowance, ReserveArrival, ReservePolicy } from './missionTypes';

export type ReservePreset = ReservePolicy['preset'];

/** What an item of a preset is flown as. */
export type ReserveItemKind =
  | 'contingency'
  | 'enRouteTime'
  | 'missedApproach'
  | 'alternate'
  | 'alternateApproach'
  | 'finalReserve';

export interface ReserveItemRule {
  readonly item: ReserveItemKind;
  /** The rule's paragraph the item implements, e.g. "14 CFR 121.645(b)(2)". */
  readonly paragraph: string;
  /** How Blockwise flies it. */
  readonly flownAs: string;
  /** Set where the flying reads more into the rule than its words: says what is interpreted. */
  readonly interpretation?: string;
}

export interface ReserveRule<P extends ReservePreset = ReservePreset> {
  readonly preset: P;
  readonly title: string;
  /** The rule's words (from memory), with the paragraph numbers. */
  readonly quotation: string;
  /** Items in the order they are flown (an alternate's items only when there is one). */
  readonly items: readonly ReserveItemRule[];
  /** The preset's default settings (SI: fractions, seconds, kg), as the rule words them; the project schema's defaults agree (test). */
  readonly defaults: ReserveDefaults[P];
}

/** Each preset's default settings (SI). */
export interface ReserveDefaults {
  readonly icaoAnnex6: { readonly contingencyFraction: number; readonly minContingencyTime_s: number; readonly finalReserveTime_s: number };
  readonly cfr121_639: { readonly finalReserveTime_s: number };
  readonly cfr121_645: { readonly enRouteFraction: number; readonly finalReserveTime_s: number };
  readonly custom: { readonly contingencyFraction: number; readonly finalReserveTime_s: number; readonly extraFuel_kg: number };
}

const MISSED_APPROACH: ReserveItemRule = {
  item: 'missedApproach',
  paragraph: 'alternate fuel',
  flownAs: 'missed approach at the destination: a set fuel, or time at the takeoff rating (default: the mission\'s take-off allowance)',
};
const ALTERNATE_APPROACH: ReserveItemRule = {
  item: 'alternateApproach',
  paragraph: 'alternate fuel',
  flownAs: 'approach and landing at the alternate: a set fuel, or time at the flightIdle fuel flow at Mach 0.2 (default: the mission\'s approach allowance)',
};
const ALTERNATE_FLIGHT = 'climb (the mission\'s first climb schedule), cruise at the alternate\'s altitude and Mach, descent to 1,500 ft above the alternate; its distance over the ground in its own wind (or in still air in a still-air study)';
const HOLD = 'hold at the reserve hold speed (default best endurance at 1.1 x the minimum-drag speed) in standard conditions (ISA, no wind)';

/** The four presets' rules. */
export const RESERVE_RULES: { readonly [P in ReservePreset]: ReserveRule<P> } = {
  icaoAnnex6: {
    preset: 'icaoAnnex6',
    title: 'ICAO Annex 6 Part I (turbine aeroplanes)',
    defaults: { contingencyFraction: 0.05, minContingencyTime_s: 300, finalReserveTime_s: 1800 },
    quotation:
      'Contingency fuel: "5 per cent of the planned trip fuel ... but in any case not lower than the amount required to fly for five minutes at holding speed at 450 m (1 500 ft) above the destination aerodrome in standard conditions"; destination alternate fuel: the fuel "to perform a missed approach at the destination aerodrome; climb to the expected cruising altitude; fly the expected routing; descend to the point where the expected approach is initiated; and conduct the approach and landing at the destination alternate aerodrome"; final reserve fuel: "to fly for 30 minutes at holding speed at 450 m (1 500 ft) above aerodrome elevation in standard conditions" (Annex 6 Part I, 4.3.6.3, quoted from memory).',
    items: [
      {
        item: 'contingency',
        paragraph: 'ICAO Annex 6 Part I 4.3.6.3 c)',
        flownAs: `the larger of the contingency fraction of the trip fuel and a minimum-contingency-time ${HOLD} at 1,500 ft above the destination`,
      },
      { ...MISSED_APPROACH, paragraph: 'ICAO Annex 6 Part I 4.3.6.3 d)' },
      { item: 'alternate', paragraph: 'ICAO Annex 6 Part I 4.3.6.3 d)', flownAs: ALTERNATE_FLIGHT },
      { ...ALTERNATE_APPROACH, paragraph: 'ICAO Annex 6 Part I 4.3.6.3 d)' },
      {
        item: 'finalReserve',
        paragraph: 'ICAO Annex 6 Part I 4.3.6.3 e)',
        flownAs: `${HOLD} at 1,500 ft above the alternate (the destination without one), from the mass left after the alternate`,
        interpretation: '"holding speed" is taken as the reserve hold speed setting; the rule does not set it',
      },
    ],
  },
  cfr121_639: {
    preset: 'cfr121_639',
    title: '14 CFR 121.639 (domestic operations)',
    defaults: { finalReserveTime_s: 2700 },
    quotation:
      '"No person may dispatch or take off an airplane unless it has enough fuel (a) to fly to the airport to which it is dispatched; (b) thereafter, to fly to and land at the most distant alternate airport (where required) for the airport to which dispatched; and (c) thereafter, to fly for 45 minutes at normal cruising fuel consumption" (14 CFR 121.639, quoted from memory).',
    items: [
      {
        ...MISSED_APPROACH,
        paragraph: '14 CFR 121.639(b)',
        interpretation: '"to fly to ... the most distant alternate" from the destination is taken to begin with a missed approach there; the rule does not name it',
      },
      { item: 'alternate', paragraph: '14 CFR 121.639(b)', flownAs: ALTERNATE_FLIGHT },
      { ...ALTERNATE_APPROACH, paragraph: '14 CFR 121.639(b)' },
      {
        item: 'finalReserve',
        paragraph: '14 CFR 121.639(c)',
        flownAs: 'the final-reserve time at the mission\'s first cruise altitude and speed rule, in the mission\'s ISA deviation',
        interpretation: '"normal cruising fuel consumption" is taken as the fuel flow at the mission\'s first cruise altitude and speed',
      },
    ],
  },
  cfr121_645: {
    preset: 'cfr121_645',
    title: '14 CFR 121.645(b) (flag and supplemental, turbine-engine airplanes)',
    defaults: { enRouteFraction: 0.1, finalReserveTime_s: 1800 },
    quotation:
      '"(1) To fly to and land at the airport to which it is released; (2) After that, to fly for a period of 10 percent of the total time required to fly from the airport of departure to, and land at, the airport to which it was released; (3) After that, to fly to and land at the most distant alternate airport specified in the flight release, if an alternate is required; and (4) After that, to fly for 30 minutes at holding speed at 1,500 feet above the alternate airport (or the destination airport if no alternate is required) under standard temperature conditions" (14 CFR 121.645(b), quoted from memory).',
    items: [
      {
        item: 'enRouteTime',
        paragraph: '14 CFR 121.645(b)(2)',
        flownAs: 'the en-route fraction of the trip time (take-off to landing) at the mission\'s first cruise altitude and speed rule',
        interpretation: 'the rule says only "to fly for a period of 10 percent of the total time"; flying it at normal cruising fuel consumption is an interpretation (common practice)',
      },
      {
        ...MISSED_APPROACH,
        paragraph: '14 CFR 121.645(b)(3)',
        interpretation: '"to fly to and land at the most distant alternate" from the destination is taken to begin with a missed approach there; the rule does not name it',
      },
      { item: 'alternate', paragraph: '14 CFR 121.645(b)(3)', flownAs: ALTERNATE_FLIGHT },
      { ...ALTERNATE_APPROACH, paragraph: '14 CFR 121.645(b)(3)' },
      {
        item: 'finalReserve',
        paragraph: '14 CFR 121.645(b)(4)',
        flownAs: `${HOLD} at 1,500 ft above the alternate (the destination without one)`,
        interpretation: '"holding speed" is taken as the reserve hold speed setting; the rule does not set it',
      },
    ],
  },
  custom: {
    preset: 'custom',
    title: 'Custom reserves',
    defaults: { contingencyFraction: 0.05, finalReserveTime_s: 1800, extraFuel_kg: 0 },
    quotation: 'No published rule: a contingency fraction of the trip fuel, an alternate, a final-reserve hold and a fixed extra fuel, as set.',
    items: [
      { item: 'contingency', paragraph: 'custom', flownAs: 'the contingency fraction of the trip fuel (carried, not flown)' },
      { ...MISSED_APPROACH, paragraph: 'custom' },
      { item: 'alternate', paragraph: 'custom', flownAs: ALTERNATE_FLIGHT },
      { ...ALTERNATE_APPROACH, paragraph: 'custom' },
      { item: 'finalReserve', paragraph: 'custom', flownAs: `${HOLD} at 1,500 ft above the alternate (the destination without one)` },
    ],
  },
};

/** Default hold speed of the reserve holds: best endurance at 1.1 x the minimum-drag speed (common practice, from memory). */
export const DEFAULT_RESERVE_HOLD_SPEED: HoldSpeed = { kind: 'bestEndurance', speedFactor: 1.1 };

/** Default missed approach when the mission has no take-off allowance: 1 min at the takeoff rating (common practice). */
export const DEFAULT_MISSED_APPROACH: ReserveAllowance = { time_s: 60, fuel_kg: null };
/** Default approach and landing when the mission has no approach allowance: 5 min at flightIdle, Mach 0.2 (common practice). */
export const DEFAULT_ALTERNATE_APPROACH: ReserveAllowance = { time_s: 300, fuel_kg: null };

/** The policy's hold speed, or the default. */
export function reserveHoldSpeed(policy: ReservePolicy): HoldSpeed {
  return policy.holdSpeed ?? DEFAULT_RESERVE_HOLD_SPEED;
}

/** The policy's arrival allowances, or the mission's take-off and approach allowances, or the defaults above. */
export function reserveArrival(input: MissionInput): ReserveArrival {
  if (input.reserves.arrival) return input.reserves.arrival;
  const takeoff = input.legs.find((l) => l.kind === 'takeoff');
  const approach = input.legs.find((l) => l.kind === 'approach');
  return {
    missedApproach: takeoff && takeoff.kind === 'takeoff' ? { time_s: takeoff.time_s, fuel_kg: takeoff.fuel_kg } : DEFAULT_MISSED_APPROACH,
    alternateApproach: approach && approach.kind === 'approach' ? { time_s: approach.time_s, fuel_kg: approach.fuel_kg } : DEFAULT_ALTERNATE_APPROACH,
  };
}

/** The leg-row name of a preset's item: "reserve: <what> (<paragraph>[; interpretation])". */
export function reserveItemName(preset: ReservePreset, item: ReserveItemKind): string {
  const rule = RESERVE_RULES[preset].items.find((i) => i.item === item);
  const what: Record<ReserveItemKind, string> = {
    contingency: 'contingency',
    enRouteTime: '10 % en-route time',
    missedApproach: 'missed approach at the destination',
    alternate: 'alternate',
    alternateApproach: 'approach and landing at the alternate',
    finalReserve: preset === 'cfr121_639' ? 'final reserve at normal cruise' : 'final reserve hold',
  };
  if (!rule) return `reserve: ${what[item]}`;
  return `reserve: ${what[item]} (${rule.paragraph}${rule.interpretation ? '; interpretation' : ''})`;
}
