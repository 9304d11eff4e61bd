/**
 * How to load each catalogued verb's module alone: `blockwise fly` loads the
 * fly verb (and the engine it needs), not every verb (with esbuild's code
 * splitting each is its own chunk). A new verb gets a line here; the type
 * makes a catalogued verb without a loader an error, and a test checks that
 * every loader gives the verb of its name.
 */
import type { Verb } from '../verb';
import type { VerbName } from './catalogue';

export const VERB_LOADERS: { readonly [name in VerbName]: () => Promise<Verb> } = {
  fly: async () => (await import('./fly')).flyVerb,
  air: async () => (await import('./air')).airVerb,
  'deck check': async () => (await import('./deck')).deckCheckVerb,
  'deck at': async () => (await import('./deck')).deckAtVerb,
  inlet: async () => (await import('./inlet')).inletVerb,
  crossover: async () => (await import('./crossover')).crossoverVerb,
  envelope: async () => (await import('./envelope')).envelopeVerb,
  'range-speeds': async () => (await import('./rangeSpeeds')).rangeSpeedsVerb,
  'payload-range': async () => (await import('./payloadRange')).payloadRangeVerb,
  compare: async () => (await import('./compare')).compareVerb,
  trade: async () => (await import('./trade')).tradeVerb,
  sweep: async () => (await import('./sweep')).sweepVerb,
  uncertainty: async () => (await import('./uncertainty')).uncertaintyVerb,
  'cycle point': async () => (await import('./cycle/point')).cyclePointVerb,
  'cycle deck': async () => (await import('./cycle/deck')).cycleDeckVerb,
  'cycle match': async () => (await import('./cycle/match')).cycleMatchVerb,
};

/** True when `name` is a catalogued verb. */
export function isVerbName(name: string): name is VerbName {
  return Object.hasOwn(VERB_LOADERS, name);
}
