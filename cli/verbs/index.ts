import type { Verb } from '../verb';
import { airVerb } from './air';
import { crossoverVerb } from './crossover';
import { deckAtVerb, deckCheckVerb } from './deck';
import { envelopeVerb } from './envelope';
import { flyVerb } from './fly';

/**
 * Every verb, in the order `blockwise --help` lists them. A new verb is a
 * module in this folder exporting a `Verb`, added here.
 */
export const verbs: readonly Verb[] = [
  flyVerb,
  airVerb,
  deckCheckVerb,
  deckAtVerb,
  crossoverVerb,
  envelopeVerb,
];
