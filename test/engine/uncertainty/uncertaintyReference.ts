/**
 * Loads test/reference/uncertaintyReference.json (written by
 * test/reference/uncertaintyReference.py with numpy/scipy) for the sampler
 * and statistics tests.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export interface UncertaintyReference {
  readonly normal: { readonly p: number[]; readonly ppf: number[]; readonly x: number[]; readonly cdf: number[] };
  readonly truncnorm: readonly { readonly a: number; readonly b: number; readonly u: number[]; readonly x: number[] }[];
  readonly percentile: { readonly sample: number[]; readonly q: number[]; readonly value: number[] };
  readonly spearman: { readonly x: number[]; readonly y: number[]; readonly rho: number };
  readonly discrepancy: { readonly points: number[][]; readonly cd: number };
  readonly lhsDiscrepancy: { readonly n: number; readonly d: number; readonly lhsMean: number; readonly lhsP99: number; readonly randomMean: number; readonly randomP01: number };
  readonly xoshiro128ss: { readonly seed: number; readonly first: number[]; readonly seed2: number; readonly first2: number[] };
}

export const ref: UncertaintyReference = JSON.parse(
  readFileSync(fileURLToPath(new URL('../../reference/uncertaintyReference.json', import.meta.url)), 'utf8'),
) as UncertaintyReference;
