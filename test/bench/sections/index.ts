/**
 * Every bench section, by file name (the bench's filters match these names
 * and the sections' titles). A static list so the bench can be bundled
 * (scripts/bench.mjs); test/bench/benchSections.test.ts checks that every
 * file in this folder is listed.
 */
import type { BenchSection } from '../benchTypes';
import { section as aero } from './aero';
import { section as analysis } from './analysis';
import { section as atmosphere } from './atmosphere';
import { section as cycle } from './cycle';
import { section as deck } from './deck';
import { section as installed } from './installed';
import { section as mission } from './mission';
import { section as peer } from './peer';

export const BENCH_SECTIONS: readonly { readonly file: string; readonly section: BenchSection }[] = [
  { file: 'aero', section: aero },
  { file: 'analysis', section: analysis },
  { file: 'atmosphere', section: atmosphere },
  { file: 'cycle', section: cycle },
  { file: 'deck', section: deck },
  { file: 'installed', section: installed },
  { file: 'mission', section: mission },
  { file: 'peer', section: peer },
];
