/**
 * The `cycle` verb's sub-verbs, one file each (`cycle point`, ...). A new
 * sub-verb is a module in this folder exporting a Verb named "cycle <sub>",
 * added to this list; cli/verbs/index.ts registers the whole list.
 */
import type { Verb } from '../../verb';
import { cycleDeckVerb } from './deck';
import { cycleMatchVerb } from './match';
import { cyclePointVerb } from './point';

export const cycleVerbs: readonly Verb[] = [cyclePointVerb, cycleDeckVerb, cycleMatchVerb];
