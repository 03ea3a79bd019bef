#!/usr/bin/env python3
"""Reference values for tests/server/engine/stats/review-stats.test.ts: Welch's t test
(scipy.stats.ttest_ind, equal_var=False), logistic fits (maximum likelihood by an independent
numpy IRLS and by scipy.optimize.minimize on the log-likelihood; Firth's penalised likelihood by
scipy.optimize.minimize), numpy.percentile quantiles, a percentile bootstrap band
(scipy.stats.bootstrap) and exact permutation tests (scipy.stats.permutation_test).
Writes tests/reference/review-stats.json. Run: python3 scripts/reference/review_stats.py"""
import json

import numpy as np
import scipy
from scipy import optimize, stats

out = {
    "source": f"scipy {scipy.__version__}, numpy {np.__version__}; scripts/reference/review_stats.py",
}

# --- Welch's t test -------------------------------------------------------------------------
welch_cases = [
    ([1, 2, 2, 3, 1, 2, 4, 2], [3, 3, 4, 2, 5, 3, 4, 4]),
    ([0.5, 1.7, 2.2, 0.9, 1.1], [1.0, 1.2, 0.8, 1.1, 0.9, 1.3, 1.05]),
    ([1, 1, 1, 2], [1, 2, 2, 2, 3, 3]),
    ([10.1, 9.8, 10.4, 10.0, 9.9, 10.2], [8.0, 12.5, 9.1, 11.7, 10.9, 7.4, 12.2, 9.0]),
    ([1, 1, 1, 1], [1, 1, 2, 1]),
    ([0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 0, 0], [3, 4, 2, 5, 3, 3, 4, 6, 2, 3, 4, 5]),
]
out["welch"] = []
for a, b in welch_cases:
    r = stats.ttest_ind(a, b, equal_var=False)
    out["welch"].append({"a": a, "b": b, "t": float(r.statistic), "df": float(r.df), "pValue": float(r.pvalue)})


# --- Logistic fits ----------------------------------------------------------------------------
def loglik(beta, x, y, n):
    eta = beta[0] + beta[1] * x
    return float(np.sum(-y * np.logaddexp(0, -eta) - (n - y) * np.logaddexp(0, eta)))


def info(beta, x, n):
    p = 1 / (1 + np.exp(-(beta[0] + beta[1] * x)))
    w = n * p * (1 - p)
    X = np.column_stack([np.ones_like(x), x])
    return X.T @ (w[:, None] * X)


def irls(x, y, n, iters=100):
    """Plain IRLS (McCullagh & Nelder 1989, §2.5): weighted least squares on the working response."""
    X = np.column_stack([np.ones_like(x), x])
    beta = np.zeros(2)
    for _ in range(iters):
        eta = X @ beta
        p = 1 / (1 + np.exp(-eta))
        w = n * p * (1 - p)
        z = eta + (y - n * p) / w
        new = np.linalg.solve(X.T @ (w[:, None] * X), X.T @ (w * z))
        if np.max(np.abs(new - beta)) < 1e-13:
            beta = new
            break
        beta = new
    return beta


def firth_objective(beta, x, y, n):
    sign, logdet = np.linalg.slogdet(info(beta, x, n))
    return -(loglik(beta, x, y, n) + 0.5 * logdet)


logistic_cases = {
    # ln mu of a row of eight cells, 12 networks each: the share with one stable state rises with mu.
    "row": (np.log([0.4, 0.55, 0.7, 0.85, 1.0, 1.2, 1.45, 1.8]), np.array([0, 1, 2, 4, 7, 9, 11, 12.0]), np.full(8, 12.0)),
    "uneven": (np.array([-2.0, -1.0, 0.0, 0.5, 1.5, 3.0]), np.array([1, 2, 3, 6, 4, 9.0]), np.array([5, 6, 8, 9, 5, 10.0])),
}
out["logisticMl"] = []
for name, (x, y, n) in logistic_cases.items():
    b_irls = irls(x, y, n)
    res = optimize.minimize(lambda b: -loglik(b, x, y, n), np.zeros(2), method="BFGS", options={"gtol": 1e-10})
    cov = np.linalg.inv(info(b_irls, x, n))
    out["logisticMl"].append({
        "name": name, "x": x.tolist(), "successes": y.astype(int).tolist(), "trials": n.astype(int).tolist(),
        "intercept": float(b_irls[0]), "slope": float(b_irls[1]),
        "interceptMinimize": float(res.x[0]), "slopeMinimize": float(res.x[1]),
        "covariance": cov.tolist(), "logLikelihood": loglik(b_irls, x, y, n),
        "crossing": float(-b_irls[0] / b_irls[1]),
    })

firth_cases = {
    # Separated: every cell below mu = 1 has no network with one stable state, every one above all.
    "separated": (np.log([0.5, 0.7, 0.9, 1.1, 1.3, 1.5]), np.array([0, 0, 0, 8, 8, 8.0]), np.full(6, 8.0)),
    "row": logistic_cases["row"],
    "quasi": (np.array([0.0, 1.0, 2.0, 3.0, 4.0]), np.array([0, 0, 2, 5, 5.0]), np.array([5, 5, 5, 5, 5.0])),
}
out["logisticFirth"] = []
for name, (x, y, n) in firth_cases.items():
    res = optimize.minimize(firth_objective, np.zeros(2), args=(x, y, n), method="Nelder-Mead",
                            options={"xatol": 1e-12, "fatol": 1e-14, "maxiter": 20000, "maxfev": 40000})
    res = optimize.minimize(firth_objective, res.x, args=(x, y, n), method="BFGS", options={"gtol": 1e-11})
    out["logisticFirth"].append({
        "name": name, "x": x.tolist(), "successes": y.astype(int).tolist(), "trials": n.astype(int).tolist(),
        "intercept": float(res.x[0]), "slope": float(res.x[1]), "crossing": float(-res.x[0] / res.x[1]),
    })

# --- Quantiles and a percentile bootstrap band ----------------------------------------------
values = [3.2, -1.0, 0.4, 7.7, 2.2, 2.2, 5.1, -0.3, 1.9]
out["quantiles"] = {"values": values, "q": [0, 0.025, 0.25, 0.5, 0.9, 0.975, 1],
                    "expected": [float(np.percentile(values, 100 * q)) for q in [0, 0.025, 0.25, 0.5, 0.9, 0.975, 1]]}

sample = [2.1, 3.4, 1.9, 5.6, 4.4, 2.8, 3.9, 6.1, 2.2, 3.0, 4.8, 1.5]
boot = stats.bootstrap((np.array(sample),), np.mean, n_resamples=400000, confidence_level=0.95,
                       method="percentile", rng=np.random.default_rng(20240601))
out["bootstrapMean"] = {"sample": sample, "resamples": 400000, "level": 0.95,
                        "lower": float(boot.confidence_interval.low), "upper": float(boot.confidence_interval.high),
                        "standardError": float(boot.standard_error)}


# --- Exact permutation tests ------------------------------------------------------------------
def mean_diff(a, b, axis):
    return np.mean(a, axis=axis) - np.mean(b, axis=axis)


out["permutation"] = []
for a, b in [([1, 2, 2, 3, 1], [3, 3, 4, 2, 5, 3]), ([0.3, 1.2, 0.8, 2.5], [1.9, 2.2, 2.8, 3.1, 1.7]), ([1, 1, 2, 1], [1, 2, 1, 1])]:
    r = stats.permutation_test((a, b), mean_diff, permutation_type="independent", alternative="two-sided",
                               n_resamples=np.inf, vectorized=True)
    out["permutation"].append({"a": a, "b": b, "difference": float(r.statistic), "pValue": float(r.pvalue)})

with open("tests/reference/review-stats.json", "w") as fh:
    json.dump(out, fh, indent=1)
print("wrote tests/reference/review-stats.json")
