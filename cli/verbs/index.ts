import type { Verb } from '../verb';
import { airVerb } from './air';
import { compareVerb } from './compare';
import { crossoverVerb } from './crossover';
import { cycleVerbs } from './cycle/index';
import { deckAtVerb, deckCheckVerb } from './deck';
import { envelopeVerb } from './envelope';
import { flyVerb } from './fly';
import { inletVerb } from './inlet';
import { payloadRangeVerb } from './payloadRange';
import { rangeSpeedsVerb } from './rangeSpeeds';
import { sweepVerb } from './sweep';
import { tradeVerb } from './trade';
import { uncertaintyVerb } from './uncertainty';

/**
 * Every verb, in the order `blockwise --help` lists them. A new verb is a
 * module in this folder exporting a `Verb`, added here.
 */
export const verbs: readonly Verb[] = [
  flyVerb,
  airVerb,
  deckCheckVerb,
  deckAtVerb,
  inletVerb,
  crossoverVerb,
  envelopeVerb,
  rangeSpeedsVerb,
  payloadRangeVerb,
  compareVerb,
  tradeVerb,
  sweepVerb,
  uncertaintyVerb,
  ...cycleVerbs,
];
