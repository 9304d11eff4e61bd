/**
 * The Monte-Carlo building blocks against outside references: the seeded
 * generator against a Python port of the published xoshiro128** and
 * SplitMix32; the normal CDF, quantile and truncated-normal draws against
 * scipy.stats; percentiles against numpy.percentile; Spearman's rho against
 * scipy.stats.spearmanr; the Latin hypercube against the defining property
 * (one point per stratum per coordinate) and against scipy.stats.qmc's
 * centred discrepancy of its own LatinHypercube (all values in
 * test/reference/uncertaintyReference.json).
 */
import { describe, expect, it } from 'vitest';
import { drawFromUnit } from '../../../engine/uncertainty/inputDistribution';
import { centredDiscrepancy, latinHypercube } from '../../../engine/uncertainty/latinHypercube';
import { normalCdf, normalQuantile } from '../../../engine/uncertainty/normalDistribution';
import { spearmanRho } from '../../../engine/uncertainty/rankCorrelation';
import { percentileOfSorted, summarize } from '../../../engine/uncertainty/sampleStatistics';
import { seededRandom } from '../../../engine/uncertainty/seededRandom';
import { expectClose } from '../../support/assertInDelta';
import { ref } from './uncertaintyReference';

describe('seededRandom (xoshiro128** seeded by SplitMix32)', () => {
  it('draws the published algorithm\'s integers (Python port, uncertaintyReference.py)', () => {
    const r = seededRandom(ref.xoshiro128ss.seed);
    expect(ref.xoshiro128ss.first.map(() => r.nextUint32())).toEqual(ref.xoshiro128ss.first);
    const r2 = seededRandom(ref.xoshiro128ss.seed2);
    expect(ref.xoshiro128ss.first2.map(() => r2.nextUint32())).toEqual(ref.xoshiro128ss.first2);
  });

  it('gives the same stream for the same seed and another for another seed', () => {
    const a = seededRandom(7);
    const b = seededRandom(7);
    const c = seededRandom(8);
    const xa = Array.from({ length: 50 }, () => a.next());
    expect(Array.from({ length: 50 }, () => b.next())).toEqual(xa);
    expect(Array.from({ length: 50 }, () => c.next())).not.toEqual(xa);
  });

  it('draws uniforms in [0, 1) with mean 1/2 and variance 1/12 (closed forms, 20,000 draws, 4 standard errors)', () => {
    const r = seededRandom(1);
    const n = 20000;
    const xs = Float64Array.from({ length: n }, () => r.next());
    expect(xs.every((x) => x >= 0 && x < 1)).toBe(true);
    const s = summarize(xs);
    expectClose(s.mean, 0.5, { abs: 4 * Math.sqrt(1 / 12 / n) }, 'uniform mean 1/2');
    expectClose(s.sd * s.sd, 1 / 12, { abs: 4 * Math.sqrt(1 / 180 / n) }, 'uniform variance 1/12 (variance of the estimator 1/(180 n))');
  });

  it('nextInt(n) stays in range and hits every value', () => {
    const r = seededRandom(3);
    const seen = new Set<number>();
    for (let i = 0; i < 500; i++) {
      const k = r.nextInt(7);
      expect(k >= 0 && k < 7 && Number.isInteger(k)).toBe(true);
      seen.add(k);
    }
    expect(seen.size).toBe(7);
  });
});

describe('normal distribution', () => {
  it('normalQuantile matches scipy.stats.norm.ppf to 1e-13 relative (Wichura AS 241)', () => {
    ref.normal.p.forEach((p, i) => expectClose(normalQuantile(p), ref.normal.ppf[i]!, { rel: 1e-13, abs: 1e-15 }, `scipy norm.ppf(${p})`));
  });
  it('normalCdf matches scipy.stats.norm.cdf to 1e-14 absolute (Marsaglia 2004)', () => {
    ref.normal.x.forEach((x, i) => expectClose(normalCdf(x), ref.normal.cdf[i]!, { abs: 1e-14, rel: 1e-9 }, `scipy norm.cdf(${x})`));
  });
  it('a truncated normal draw by inversion matches scipy.stats.truncnorm.ppf', () => {
    for (const t of ref.truncnorm) {
      t.u.forEach((u, i) => {
        const x = drawFromUnit({ kind: 'normal', mean: 0, sd: 1, min: t.a, max: t.b }, u);
        expectClose(x, t.x[i]!, { abs: 1e-9 }, `scipy truncnorm.ppf(${u}, ${t.a}, ${t.b})`);
      });
    }
  });
  it('scales by mean and sd, and a zero sd gives the mean exactly', () => {
    const x = drawFromUnit({ kind: 'normal', mean: 10, sd: 2, min: 0, max: 20 }, 0.975);
    expectClose(x, 10 + 2 * normalQuantile(normalCdf(-5) + 0.975 * (normalCdf(5) - normalCdf(-5))), { rel: 1e-15 }, 'x = mean + sd z');
    expect(drawFromUnit({ kind: 'normal', mean: 3.25, sd: 0 }, 0.3)).toBe(3.25);
    expect(drawFromUnit({ kind: 'uniform', min: -2, max: -2 }, 0.9)).toBe(-2);
  });
  it('a discrete draw picks alternatives by cumulative weight', () => {
    const d = { kind: 'discrete' as const, weights: [1, 3, 0, 1] };
    expect([0, 0.19, 0.2, 0.79, 0.8, 0.999].map((u) => drawFromUnit(d, u))).toEqual([0, 0, 1, 1, 3, 3]);
  });
});

describe('sample statistics', () => {
  it('percentiles match numpy.percentile (linear method)', () => {
    const sorted = Float64Array.from(ref.percentile.sample).sort();
    ref.percentile.q.forEach((q, i) => expectClose(percentileOfSorted(sorted, q), ref.percentile.value[i]!, { abs: 1e-12 }, `numpy.percentile q=${q}`));
  });
  it("Spearman's rho with ties matches scipy.stats.spearmanr", () => {
    expectClose(spearmanRho(ref.spearman.x, ref.spearman.y)!, ref.spearman.rho, { abs: 1e-14 }, 'scipy.stats.spearmanr');
  });
  it('rho is null, not NaN, for a constant sample', () => {
    expect(spearmanRho([1, 1, 1], [1, 2, 3])).toBeNull();
  });
});

describe('latinHypercube (McKay, Beckman & Conover 1979)', () => {
  it('puts exactly one point in each of the n strata of every coordinate', () => {
    const n = 37;
    const pts = latinHypercube(n, 5, seededRandom(11));
    for (let j = 0; j < 5; j++) {
      const strata = pts.map((p) => Math.floor(p[j]! * n)).sort((a, b) => a - b);
      expect(strata).toEqual(Array.from({ length: n }, (_, k) => k));
    }
  });
  it('our centred discrepancy equals scipy.stats.qmc.discrepancy on a fixed point set', () => {
    expectClose(centredDiscrepancy(ref.discrepancy.points.map((p) => Float64Array.from(p))), ref.discrepancy.cd, { rel: 1e-12 }, 'scipy qmc.discrepancy (CD)');
  });
  it("is as uniform as scipy's LatinHypercube: mean discrepancy over 100 seeds within scipy's 400-seed spread, far below plain random sampling", () => {
    const { n, d, lhsMean, lhsP99, randomMean } = ref.lhsDiscrepancy;
    const values = Array.from({ length: 100 }, (_, s) => centredDiscrepancy(latinHypercube(n, d, seededRandom(1000 + s))));
    const mean = values.reduce((a, b) => a + b, 0) / values.length;
    // The mean of 100 draws from scipy's distribution lies within +/-25 % of scipy's mean (its sd is about 0.3 of the mean: 4 standard errors = 12 %).
    expectClose(mean, lhsMean, { rel: 0.25 }, 'scipy.stats.qmc.LatinHypercube, 400 seeds');
    expect(Math.max(...values)).toBeLessThan(1.5 * lhsP99);
    expect(mean).toBeLessThan(0.5 * randomMean);
  });
  it('is reproducible from the seed', () => {
    expect(latinHypercube(8, 3, seededRandom(5))).toEqual(latinHypercube(8, 3, seededRandom(5)));
  });
});
