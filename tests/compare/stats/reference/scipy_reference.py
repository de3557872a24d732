"""Reference values pasted into tests/compare/stats/*.test.ts.

Not run by the tests (they never need Python). Regenerate with Debian's interpreter, which has the
packages: /usr/bin/python3 tests/compare/stats/reference/scipy_reference.py
Versions used for the values in the tests: scipy 1.10.1, numpy 1.24.2, statsmodels 0.13.5 (Debian 12).
Every printed line names the exact call that produced the value.
"""
import warnings

import numpy as np
import scipy
import scipy.special as sp
import scipy.stats as st
import statsmodels
from scipy.stats._hypotests import _get_wilcoxon_distr  # private: exact signed-rank pmf
from scipy.stats._resampling import _bca_interval  # private: BCa levels used by scipy.stats.bootstrap
from statsmodels.stats.multitest import multipletests

warnings.simplefilter("ignore")
print(f"# scipy {scipy.__version__}, numpy {np.__version__}, statsmodels {statsmodels.__version__}")


def section(name):
    print(f"\n## {name}")


section("scipy.stats.norm.ppf(p)")
for p in [1e-300, 1e-20, 1e-12, 1e-5, 0.001, 0.025, 0.0749, 0.075, 0.3, 0.5, 0.6, 0.925, 0.9251, 0.975, 0.999, 1 - 1e-12]:
    print(f"[{p!r}, {float(st.norm.ppf(p))!r}],")

section("scipy.stats.norm.cdf(z)")
for z in [-20, -10, -5, -3, -1.96, -1.5, -1.2247, -1.2, -1, -0.5, 0, 0.3, 1.2, 1.2247, 1.25, 2, 5, 8]:
    print(f"[{z!r}, {float(st.norm.cdf(z))!r}],")

section("scipy.stats.norm.sf(z)")
for z in [0.5, 1.5, 3, 5, 10, 20, 37]:
    print(f"[{z!r}, {float(st.norm.sf(z))!r}],")

section("scipy.special.erfc(x)")
for x in [-3, -1.3, -0.5, 0, 1e-8, 0.5, 1.2, 1.3, 2, 5, 10, 26]:
    print(f"[{x!r}, {float(sp.erfc(x))!r}],")

section("scipy.special.gammaln(x)")
for x in [1e-5, 0.5, 1, 1.5, 2, 3.7, 10, 14.9, 15, 100.5, 1e5]:
    print(f"[{x!r}, {float(sp.gammaln(x))!r}],")

section("scipy.special.betainc(a, b, x)")
for a, b, x in [(0.5, 0.5, 0.3), (2, 3, 0.4), (5, 0.5, 0.9), (0.5, 5, 0.01), (50, 0.5, 0.99), (10, 10, 0.5), (1.5, 2.5, 0.999)]:
    print(f"[{a!r}, {b!r}, {x!r}, {float(sp.betainc(a, b, x))!r}],")

section("scipy.stats.t.cdf(t, df), scipy.stats.t.sf(t, df)")
for df in [1, 2, 3, 5, 9.5, 29, 100, 1000]:
    for t in [-50, -4, -2.1, -0.7, 0, 0.7, 2.1, 4, 50]:
        print(f"[{df!r}, {t!r}, {float(st.t.cdf(t, df))!r}, {float(st.t.sf(t, df))!r}],")

section("scipy.stats.t.cdf(-1.7, df), large df")
for df in [1e4, 1e5, 1e6]:
    print(f"[{df!r}, {float(st.t.cdf(-1.7, df))!r}],")

section("scipy.stats.ttest_1samp(d, 0, alternative=...)")
ex = [1.1, 2.3, 0.4, -0.5, 3.2, 1.7, 0.9, 2.2]
for alt in ["two-sided", "greater", "less"]:
    res = st.ttest_1samp(ex, 0, alternative=alt)
    print(f"ttest_1samp({ex}, 0, alternative={alt!r}) -> t {float(res.statistic)!r}, p {float(res.pvalue)!r}")
d20 = [-0.027, -0.6743, 0.7946, 0.725, -0.1412, 0.2003, -1.5037, -0.5824, 0.5166, 0.8955, 0.291, -0.5228, -0.0551,
       0.8253, -1.0667, 1.5048, 0.0714, -0.505, -0.7395, -0.8292]
res = st.ttest_1samp(d20, 0)
print(f"ttest_1samp(d20, 0) -> t {float(res.statistic)!r}, p {float(res.pvalue)!r}")


def wil(name, x, **kw):
    res = st.wilcoxon(x, **kw)
    args = ", ".join([name] + [f"{k}={v!r}" for k, v in kw.items()])
    print(f"wilcoxon({args}) -> statistic {float(res.statistic)!r}, pvalue {float(res.pvalue)!r}")


section("scipy.stats.wilcoxon")
wil("ex", ex)
wil("ex", ex, alternative="greater")
wil("ex", ex, alternative="less")
wil("[1, -2, 3, -4, -5, 6, 7, -8]", [1, -2, 3, -4, -5, 6, 7, -8])
for kw in [{}, {"alternative": "greater"}, {"alternative": "less"}, {"mode": "approx"},
           {"mode": "approx", "correction": True}, {"mode": "approx", "correction": True, "alternative": "less"}]:
    wil("d20", d20, **kw)
dt = [1.5, -0.5, 2.0, 2.0, -2.0, 3.5, 0.5, 1.0, -1.0, 4.0, 2.5, 1.5]
for kw in [{"mode": "approx"}, {"mode": "approx", "correction": True}, {"mode": "approx", "alternative": "greater"},
           {"mode": "approx", "alternative": "greater", "correction": True},
           {"mode": "approx", "alternative": "less", "correction": True}]:
    wil("dt", dt, **kw)
dz = [0.0, 0.3, -0.1, 0.0, 0.7, 0.3, 0.9, -0.4, 1.2, 0.0, 0.5, 0.8]
wil("dz", dz, mode="approx")
wil("dz", dz, mode="approx", correction=True, alternative="greater")
dz2 = [0.0, 0.31, -0.12, 0.72, 0.0, 0.93, -0.44, 1.25, 0.58, 0.86, 0.17]
dz2nz = [v for v in dz2 if v != 0]
wil("dz2 without zeros", dz2nz)
wil("dz2 without zeros", dz2nz, alternative="greater")
wil("dz2", dz2, mode="approx")
rng = np.random.default_rng(20240501)
_ = rng.normal(0.3, 1, 20)  # d20 was drawn first from this generator
d50 = [round(float(v), 5) for v in rng.normal(-0.2, 1, 50)]
d60 = [round(float(v), 5) for v in rng.normal(0.25, 1, 60)]
print("d50 =", d50)
print("d60 =", d60)
wil("d50", d50)
wil("d50", d50, alternative="less")
wil("d60", d60)
wil("d60", d60, correction=True)
wil("d60", d60, alternative="greater")

section("TOST legs: scipy.stats.wilcoxon on the shifted samples")
d10 = [0.12, -0.05, 0.31, 0.08, 0.22, -0.11, 0.17, 0.40, 0.03, 0.26]
for delta in [0.3, 0.2, 0.1]:
    wil(f"[v + {delta} for v in d10]", [v + delta for v in d10], alternative="greater")
    wil(f"[v - {delta} for v in d10]", [v - delta for v in d10], alternative="less")
wil("[v - 0.1 for v in d10]", [v - 0.1 for v in d10], alternative="less", mode="approx")  # has a tie
wil("[v + 0.5 for v in d60]", [v + 0.5 for v in d60], alternative="greater")
wil("[v - 0.5 for v in d60]", [v - 0.5 for v in d60], alternative="less")

section("exact signed-rank cdf: np.cumsum(scipy.stats._hypotests._get_wilcoxon_distr(n)); C = #{w: cdf[w] <= (1-level)/2}")
for n in [5, 6, 8, 10, 20, 30, 50]:
    cdf = np.cumsum(_get_wilcoxon_distr(n))
    for level in [0.9, 0.95, 0.99]:
        c = int(np.sum(cdf <= (1 - level) / 2))
        achieved = 1 - 2 * cdf[c - 1] if c > 0 else 1.0
        print(f"[{n}, {level}, {c}, {float(achieved)!r}],")

section("Hodges-Lehmann by brute force: sorted Walsh averages (numpy), C from _get_wilcoxon_distr")
d10 = [0.12, -0.05, 0.31, 0.08, 0.22, -0.11, 0.17, 0.40, 0.03, 0.26]
for level in [0.95, 0.9]:
    x = np.asarray(d10)
    w = np.sort([(x[i] + x[j]) / 2 for i in range(len(x)) for j in range(i, len(x))])
    cdf = np.cumsum(_get_wilcoxon_distr(len(x)))
    c = int(np.sum(cdf <= (1 - level) / 2))
    print(f"d10 level {level}: estimate {float(np.median(w))!r}, lower {float(w[c - 1])!r}, upper {float(w[len(w) - c])!r}")


def mwu(name, x, y, **kw):
    res = st.mannwhitneyu(x, y, **kw)
    args = ", ".join([name] + [f"{k}={v!r}" for k, v in kw.items()])
    print(f"mannwhitneyu({args}) -> U {float(res.statistic)!r}, p {float(res.pvalue)!r}")


section("scipy.stats.mannwhitneyu")
x, y = [1, 2, 3, 4, 5], [3, 4, 5, 6, 7, 8]
for kw in [{"method": "exact"}, {"method": "asymptotic"}, {"method": "asymptotic", "use_continuity": False}, {},
           {"alternative": "less", "method": "asymptotic"}]:
    mwu("[1..5], [3..8]", x, y, **kw)
x, y = [0.8, 1.9, 2.7, 3.1, 4.6], [2.2, 3.9, 5.4, 6.1, 7.3, 8.8]
for alt in ["two-sided", "greater", "less"]:
    mwu("x5, y6", x, y, method="exact", alternative=alt)
rng = np.random.default_rng(7)
x20 = [round(float(v), 4) for v in rng.normal(0, 1, 20)]
y25 = [round(float(v), 4) for v in rng.normal(0.6, 1, 25)]
print("x20 =", x20)
print("y25 =", y25)
mwu("x20, y25", x20, y25, method="exact")
mwu("x20, y25", x20, y25, method="exact", alternative="less")
mwu("x20, y25", x20, y25, method="asymptotic")
x30 = [float(v) for v in rng.integers(0, 8, 30)]
y40 = [float(v) for v in rng.integers(1, 9, 40)]
print("x30 =", x30)
print("y40 =", y40)
for kw in [{}, {"use_continuity": False}, {"alternative": "greater"}, {"alternative": "less"}]:
    mwu("x30, y40", x30, y40, **kw)

section("statsmodels.stats.multitest.multipletests(p, alpha=0.05, method=...)[1]")
bh_example = [0.0001, 0.0004, 0.0019, 0.0095, 0.0201, 0.0278, 0.0298, 0.0344, 0.0459, 0.3240, 0.4262, 0.5719,
              0.6528, 0.7590, 1.000]
mixed = [0.04, 0.01, 0.03, 0.04, 0.2, 0.005, 0.9, 0.03]
for p in [bh_example, mixed]:
    for m in ["holm", "fdr_bh"]:
        rej, pc, _, _ = multipletests(p, alpha=0.05, method=m)
        print(f"multipletests({p}, alpha=0.05, method={m!r}) -> reject {list(map(bool, rej))}, "
              f"pvals_corrected {[float(v) for v in pc]}")

section("BCa levels: scipy.stats._resampling._bca_interval((data,), mean, axis=-1, alpha, theta_hat_b, batch=None)")


def mean(x, axis=-1):
    return np.mean(x, axis=axis)


cases = [
    (np.array([0.21, -0.35, 0.48, 0.05, 0.92, 0.13, -0.08, 0.61]),
     np.array([0.31, 0.12, 0.25, 0.44, 0.19, 0.02, 0.37, 0.28, 0.22, 0.50, 0.09, 0.246, 0.33, 0.16, 0.41, 0.27,
               0.246, 0.14, 0.58, 0.21]), [0.9, 0.95]),
    (np.array([0.5, 0.25, -0.25, 1.0, 0.75, 0.0, 0.5, 0.25]),
     np.array([0.375, 0.5, 0.25, 0.375, 0.625, 0.125, 0.4375, 0.3125, 0.375, 0.5625, 0.1875, 0.25]), [0.95]),
]
for data, tb, levels in cases:
    print("data", list(data), "theta_hat", float(np.mean(data)))
    print("jackknife", [float(np.mean(np.delete(data, i))) for i in range(len(data))])
    for cl in levels:
        a1, a2, ah = _bca_interval((data,), mean, axis=-1, alpha=(1 - cl) / 2, theta_hat_b=tb, batch=None)
        a1, a2, ah = float(np.squeeze(a1)), float(np.squeeze(a2)), float(np.squeeze(ah))
        print(f"level {cl}: alpha_1 {a1!r}, alpha_2 {a2!r}, a_hat {ah!r}, "
              f"np.percentile lo {float(np.percentile(tb, a1 * 100))!r}, hi {float(np.percentile(tb, a2 * 100))!r}")
