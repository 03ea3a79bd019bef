#!/usr/bin/env python3
"""Reference values for tests/server/engine/stats: Student t and normal quantiles and CDFs, the
Student-t interval of a mean and the Wilson interval of a proportion, all from scipy.stats.
Writes tests/reference/stats.json. Run: python3 scripts/reference/stats_reference.py"""
import json, scipy, numpy as np
from scipy import stats

sample = [2.0, 3.0, 3.0, 5.0, 7.0, 1.0, 4.0]
m, se = float(np.mean(sample)), float(stats.sem(sample))
lo, hi = stats.t.interval(0.95, len(sample) - 1, loc=m, scale=se)
out = {
    "source": f"scipy {scipy.__version__} (scipy.stats), numpy {np.__version__}; scripts/reference/stats_reference.py",
    "tQuantile": [{"p": p, "df": df, "value": float(stats.t.ppf(p, df))} for p, df in [(0.975, 1), (0.975, 4), (0.975, 9), (0.975, 30), (0.95, 2), (0.995, 100), (0.025, 7)]],
    "tCdf": [{"t": t, "df": df, "value": float(stats.t.cdf(t, df))} for t, df in [(0.5, 3), (-1.7, 12), (2.5, 1), (4.0, 50)]],
    "normalQuantile": [{"p": p, "value": float(stats.norm.ppf(p))} for p in [0.975, 0.995, 0.9, 0.5, 0.01]],
    "normalCdf": [{"z": z, "value": float(stats.norm.cdf(z))} for z in [-3.0, -0.3, 0.0, 1.0, 2.5, 6.0]],
    "meanInterval": {"values": sample, "level": 0.95, "mean": m, "lower": float(lo), "upper": float(hi)},
    "wilson": [],
}
for k, n in [(0, 10), (3, 10), (10, 10), (37, 50), (1, 1)]:
    ci = stats.binomtest(k, n).proportion_ci(confidence_level=0.95, method="wilson")
    out["wilson"].append({"k": k, "n": n, "lower": float(ci.low), "upper": float(ci.high)})
with open("tests/reference/stats.json", "w") as fh:
    json.dump(out, fh, indent=1)
print("wrote tests/reference/stats.json")
