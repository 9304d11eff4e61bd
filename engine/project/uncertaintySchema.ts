/**
 * The project file's `uncertainty` block: the inputs declared uncertain,
 * each with its distribution and the reason for it, and the Monte-Carlo
 * settings (samples, seed). Numbers are in each input's own unit (see
 * docs/uncertainty.md): CD0 in drag counts, K and TSFC as fractions ("3 %"),
 * OEW as a mass, coefficients and recovery and lip-suction offsets as plain
 * numbers. Cross-field rules (inlet names, bounds around the mean) are in
 * projectChecks.ts.
 */
import * as z from 'zod';
import { quantity } from './quantityField';
import type { Dimension } from '../units/quantity';

/** Largest Monte-Carlo sample a project may ask for. */
export const MAX_UNCERTAINTY_SAMPLES = 100000;

/**
 * The distribution field of an input of `dimension`, made once per dimension and shared by the inputs (a zod
 * schema holds no state of a parse): seven of the eight inputs are dimensionless, and each distribution is a dozen
 * schemas that every start of the command line would build again.
 */
function distribution(dimension: Dimension) {
  let made = DISTRIBUTIONS.get(dimension);
  if (made === undefined) {
    made = makeDistribution(dimension);
    DISTRIBUTIONS.set(dimension, made);
  }
  return made;
}

const DISTRIBUTIONS = new Map<Dimension, ReturnType<typeof makeDistribution>>();

function makeDistribution(dimension: Dimension) {
  const q = () => quantity(dimension);
  return z.discriminatedUnion('kind', [
    z.strictObject({
      kind: z.literal('normal'),
      mean: q().default(0),
      sd: quantity(dimension, { min: 0, what: 'a standard deviation >= 0' }),
      /** Truncation bounds; absent = mean -/+ 3 sd. */
      min: q().optional(),
      max: q().optional(),
    }),
    z.strictObject({ kind: z.literal('uniform'), min: q(), max: q() }),
  ]);
}

const reason = z.string().default('');
const inletName = z.string().trim().min(1, { message: 'expected the name of an inlet design' });

export const uncertainInputSchema = z.discriminatedUnion('input', [
  /** Added to CD0, in drag counts (1 count = 0.0001). */
  z.strictObject({ input: z.literal('cd0'), distribution: distribution('dimensionless'), reason }),
  /** Relative change of the induced-drag factor K ("5 %" = K x 1.05). */
  z.strictObject({ input: z.literal('k'), distribution: distribution('dimensionless'), reason }),
  /** Relative change of fuel flow at a given thrust, i.e. of TSFC ("2 %"). */
  z.strictObject({ input: z.literal('tsfc'), distribution: distribution('dimensionless'), reason }),
  /** Added to the operating empty weight (a mass). */
  z.strictObject({ input: z.literal('oew'), distribution: distribution('mass'), reason }),
  /** Added to Raymer's ram-recovery coefficient C_ram. */
  z.strictObject({ input: z.literal('cRam'), distribution: distribution('dimensionless'), reason }),
  /** Added to Raymer's bleed coefficient C_bleed. */
  z.strictObject({ input: z.literal('cBleed'), distribution: distribution('dimensionless'), reason }),
  /** Added to every recovery of an inlet's recovery table (absent inlet = every table inlet, one draw). */
  z.strictObject({ input: z.literal('recovery'), inlet: inletName.optional(), distribution: distribution('dimensionless'), reason }),
  /** Added to an inlet's lip-suction fraction (absent inlet = every inlet, one draw). */
  z.strictObject({ input: z.literal('lipSuction'), inlet: inletName.optional(), distribution: distribution('dimensionless'), reason }),
  /** The recovery method as a discrete alternative: each sample flies one, with these weights. */
  z.strictObject({
    input: z.literal('recoveryMethod'),
    alternatives: z
      .array(
        z.strictObject({
          method: z.enum(['raymerHeld', 'raymerScaled', 'deckSensitivities']),
          weight: z.number().positive({ message: 'expected a weight > 0' }).finite(),
        }),
      )
      .min(1, { message: 'expected at least one alternative' }),
    reason,
  }),
]);

export const uncertaintySchema = z.strictObject({
  /** Monte-Carlo sample size (missions per design). */
  samples: z.number().int({ message: 'expected a whole number of samples' }).min(2).max(MAX_UNCERTAINTY_SAMPLES).default(200),
  /** Seed of the sampler: the same seed gives the same numbers. */
  seed: z.number().int({ message: 'expected a whole-number seed' }).min(0).max(4294967295).default(1),
  inputs: z.array(uncertainInputSchema).default([]),
});

