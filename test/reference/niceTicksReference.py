"""Independent reference for renderer/charts/niceTicks.ts: Heckbert's loose
labelling ("Nice numbers for graph labels", Graphics Gems, 1990), written from
the paper's pseudo-code with numpy. Run: python3 test/reference/niceTicksReference.py
and paste the printed lists into test/renderer/charts/niceTicks.test.ts."""
import math
import numpy as np


def nicenum(x, rnd):
    e = math.floor(math.log10(x))
    f = x / 10 ** e
    if rnd:
        nf = 1 if f < 1.5 else 2 if f < 3 else 5 if f < 7 else 10
    else:
        nf = 1 if f <= 1 else 2 if f <= 2 else 5 if f <= 5 else 10
    return nf * 10 ** e


def loose_label(lo, hi, ntick=5):
    rng = nicenum(hi - lo, False)
    d = nicenum(rng / (ntick - 1), True)
    gmin = math.floor(lo / d) * d
    gmax = math.ceil(hi / d) * d
    nfrac = max(-math.floor(math.log10(d)), 0)
    ticks = np.arange(gmin, gmax + 0.5 * d, d)
    return [round(float(t), nfrac) for t in ticks], nfrac


for lo, hi, n in [
    (0.3752, 0.5248502732003647, 5),   # part of a crossover Mach sweep
    (0.05, 0.95, 5),                   # a full Mach sweep
    (0.9752, 0.9951, 5),               # inlet recovery
    (1050.3, 5250.7, 5),               # force in lbf
    (-123.4, 56.7, 5),                 # a signed block-fuel difference
    (0, 3200, 6),                      # payload-range range in nmi
]:
    print((lo, hi, n), loose_label(lo, hi, n))
