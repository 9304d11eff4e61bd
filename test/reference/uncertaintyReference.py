#!/usr/bin/env python3
"""Independent reference values for the uncertainty tests (Blockwise).

With numpy/scipy, written apart from the TypeScript code:
  - scipy.stats.norm.cdf / norm.ppf and scipy.stats.truncnorm.ppf at fixed points;
  - numpy.percentile (default 'linear' method) and scipy.stats.spearmanr (ties
    at average rank) of fixed samples;
  - scipy.stats.qmc.discrepancy (centred L2, 'CD') of a fixed point set, and the
    spread of that discrepancy over 400 seeds of scipy.stats.qmc.LatinHypercube
    (n = 32, d = 4, scramble=True, no optimisation) and of plain uniform random
    samples of the same size: the property our own Latin hypercube must meet;
  - the first outputs of xoshiro128** seeded by SplitMix32, from a plain Python
    port of the published algorithms (Blackman & Vigna; prng.di.unimi.it).
Run:  python3 test/reference/uncertaintyReference.py > test/reference/uncertaintyReference.json
"""
import json
import numpy as np
from scipy import stats
from scipy.stats import qmc

M32 = 0xFFFFFFFF


def splitmix32(state):
    s = (state + 0x9E3779B9) & M32
    z = s
    z = ((z ^ (z >> 16)) * 0x85EBCA6B) & M32
    z = ((z ^ (z >> 13)) * 0xC2B2AE35) & M32
    z ^= z >> 16
    return z, s


def rotl(x, k):
    return ((x << k) | (x >> (32 - k))) & M32


def xoshiro128ss(seed, count):
    state = seed & M32
    s = []
    for _ in range(4):
        out, state = splitmix32(state)
        s.append(out)
    outs = []
    for _ in range(count):
        result = (rotl((s[1] * 5) & M32, 7) * 9) & M32
        t = (s[1] << 9) & M32
        s[2] ^= s[0]
        s[3] ^= s[1]
        s[1] ^= s[2]
        s[0] ^= s[3]
        s[2] ^= t
        s[3] = rotl(s[3], 11)
        outs.append(result)
    return outs


ps = [1e-12, 1e-6, 0.001, 0.025, 0.05, 0.2, 0.5, 0.7, 0.95, 0.975, 0.999, 1 - 1e-9]
xs = [-8.0, -5.0, -3.0, -1.96, -1.0, -0.3, 0.0, 0.4, 1.0, 2.5, 6.0]
trunc = [
    {"a": -1.0, "b": 2.0, "u": [0.0, 0.1, 0.5, 0.9, 0.999]},
    {"a": -3.0, "b": 3.0, "u": [0.01, 0.25, 0.5, 0.75, 0.99]},
    {"a": 0.5, "b": 4.0, "u": [0.05, 0.5, 0.95]},
]
for t in trunc:
    t["x"] = [float(stats.truncnorm.ppf(u, t["a"], t["b"])) for u in t["u"]]

sample = [3.0, -1.0, 2.5, 2.5, 7.0, 0.0, -4.0, 2.5, 10.0, 1.0, 6.0]
other = [1.0, 0.0, 2.0, 3.0, 9.0, -1.0, -2.0, 2.0, 8.0, 0.5, 4.0]
rho = stats.spearmanr(sample, other).statistic

fixed = np.array([[0.1, 0.2, 0.7], [0.4, 0.9, 0.3], [0.8, 0.5, 0.05], [0.65, 0.15, 0.95], [0.3, 0.6, 0.5]])
n, d = 32, 4
lhs_cd = [qmc.discrepancy(qmc.LatinHypercube(d=d, seed=s).random(n)) for s in range(400)]
mc_cd = [qmc.discrepancy(np.random.default_rng(s).random((n, d))) for s in range(400)]

print(json.dumps({
    "normal": {
        "p": ps, "ppf": [float(stats.norm.ppf(p)) for p in ps],
        "x": xs, "cdf": [float(stats.norm.cdf(x)) for x in xs],
    },
    "truncnorm": trunc,
    "percentile": {"sample": sample, "q": [0, 5, 50, 95, 100, 37.5],
                   "value": [float(np.percentile(sample, q)) for q in [0, 5, 50, 95, 100, 37.5]]},
    "spearman": {"x": sample, "y": other, "rho": float(rho)},
    "discrepancy": {"points": fixed.tolist(), "cd": float(qmc.discrepancy(fixed))},
    "lhsDiscrepancy": {
        "n": n, "d": d,
        "lhsMean": float(np.mean(lhs_cd)), "lhsP99": float(np.percentile(lhs_cd, 99)),
        "randomMean": float(np.mean(mc_cd)), "randomP01": float(np.percentile(mc_cd, 1)),
    },
    "xoshiro128ss": {"seed": 42, "first": xoshiro128ss(42, 8), "seed2": 20261202, "first2": xoshiro128ss(20261202, 4)},
}, indent=1))
