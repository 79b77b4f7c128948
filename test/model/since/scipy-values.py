# Generates scipy-values.json: reference values for the release review's rank statistics, from
# SciPy 1.17.1 (https://scipy.org), a general-purpose statistics library used as a second opinion.
#   python3 test/model/since/scipy-values.py > test/model/since/scipy-values.json
# - kendall: scipy.stats.kendalltau of the values against their order (time). For series without
#   ties, method="exact" gives the exact two-sided p of S; with ties, method="asymptotic" gives
#   2 Q(|S| / sqrt Var S) with the tie-corrected variance (no continuity correction).
# - theil: scipy.stats.theilslopes(y, x, alpha=0.95): slope and Sen's interval (nearest ranks).
# - ranksum: scipy.stats.mannwhitneyu(b, a, method="asymptotic", use_continuity=True): U of b and
#   the two-sided p with the tie correction.
# - quantile: scipy.stats.norm.ppf.
# - shift: the median of all pairwise differences b_j - a_i, by numpy.
import json

import numpy as np
import scipy
from scipy import stats

rng = np.random.default_rng(20260316)
out = {"scipy": scipy.__version__, "kendall": [], "theil": [], "ranksum": [], "quantile": [], "shift": []}

for n in (5, 8, 12, 20, 35):
    x = np.round(rng.normal(0, 1, n) + 0.05 * np.arange(n), 6)
    r = stats.kendalltau(np.arange(n), x, method="exact")
    out["kendall"].append({"values": x.tolist(), "tau": float(r.statistic), "p": float(r.pvalue), "method": "exact"})
for n in (15, 30, 60):
    x = np.round(rng.normal(0, 1, n) + 0.03 * np.arange(n), 0)  # rounded: many ties
    r = stats.kendalltau(np.arange(n), x, method="asymptotic")
    out["kendall"].append({"values": x.tolist(), "tau": float(r.statistic), "p": float(r.pvalue), "method": "asymptotic"})

for n in (10, 25, 50):
    x = np.arange(n, dtype=float)
    y = np.round(3 + 0.2 * x + rng.standard_t(3, n), 6)
    r = stats.theilslopes(y, x, alpha=0.95)
    out["theil"].append({"values": y.tolist(), "slope": float(r.slope), "low": float(r.low_slope), "high": float(r.high_slope)})

for m, n, rounding in ((8, 9, 6), (15, 12, 6), (30, 25, 0), (10, 40, 1)):
    a = np.round(rng.normal(0, 1, m), rounding)
    b = np.round(rng.normal(0.6, 1, n), rounding)
    r = stats.mannwhitneyu(b, a, alternative="two-sided", method="asymptotic", use_continuity=True)
    out["ranksum"].append({"a": a.tolist(), "b": b.tolist(), "u": float(r.statistic), "p": float(r.pvalue)})
    out["shift"].append({"a": a.tolist(), "b": b.tolist(), "shift": float(np.median(np.subtract.outer(b, a)))})

for p in (1e-300, 1e-20, 1e-8, 0.001, 0.025, 0.1, 0.3, 0.5, 0.7, 0.975, 0.999999):
    out["quantile"].append({"p": p, "z": float(stats.norm.ppf(p))})

print(json.dumps(out, indent=1))
