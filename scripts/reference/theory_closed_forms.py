"""Reference values for shared/theory, computed independently with numpy/scipy.

Writes tests/reference/theory-closed-forms.json. Re-run: python3 scripts/reference/theory_closed_forms.py
Formulas: Sigma_tot (Fyodorov & Khoruzhenko, PNAS 113 (2016) 6827), Sigma_st and the boundary
m_st (Ben Arous, Fyodorov & Khoruzhenko, PNAS 118 (2021) e2023719118), EKS expected real
eigenvalues (Edelman, Kostlan & Shub, J. AMS 7 (1994) 247), one-dimensional Kac-Rice counts.
"""
import json
import math
import pathlib

import numpy as np
import scipy
from scipy import optimize, special, stats

OUT = pathlib.Path(__file__).resolve().parents[2] / "tests" / "reference" / "theory-closed-forms.json"


def sigma_total(m):
    return 0.0 if m >= 1 else (m * m - 1) / 2 - math.log(m)


def sigma_stable(m, tau):
    return 0.0 if m >= 1 else -math.log(m) - (1 - m) - (1 - m) ** 2 / (2 * tau)


def m_stable(tau):
    # root of (1-m)^2 = 2 tau (m - 1 - ln m) on (0, 1), found by scipy's Brent method in ln m
    f = lambda u: (1 - np.exp(u)) ** 2 - 2 * tau * (np.expm1(u) - u)
    return float(np.exp(optimize.brentq(f, -1 - 1 / (2 * tau) - 5, -1e-9, xtol=1e-15, rtol=1e-15)))


def eks(n):
    return 0.5 + math.sqrt(2) * special.hyp2f1(1, -0.5, n, 0.5) * math.exp(special.gammaln(n + 0.5) - special.gammaln(n)) / math.sqrt(math.pi)


def one_dim(m):
    total = special.erf(m / math.sqrt(2)) + math.sqrt(2 / math.pi) * math.exp(-m * m / 2) / m
    stable = stats.norm.cdf(m) + stats.norm.pdf(m) / m
    return total, stable


ms = [0.05, 0.2, 0.3, 0.5, 0.8, 0.95, 1.0, 1.3]
pairs = [(0.3, 0.6), (0.5, 0.5), (0.2, 0.2), (0.8, 0.9), (0.6, 1.0), (0.1, 0.05)]
taus = [0.05, 0.2, 0.5, 0.8, 0.99]
out = {
    "source": f"scripts/reference/theory_closed_forms.py with numpy {np.__version__}, scipy {scipy.__version__} "
    "(scipy.optimize.brentq, scipy.special.hyp2f1/gammaln/erf, scipy.stats.norm)",
    "sigmaTotal": [{"m": m, "value": sigma_total(m)} for m in ms],
    "sigmaStable": [{"m": m, "tau": t, "value": sigma_stable(m, t)} for m, t in pairs],
    "mStable": [{"tau": t, "value": m_stable(t)} for t in taus],
    "ginibreRealEigenvalues": [{"n": n, "value": eks(n)} for n in [1, 2, 3, 5, 10, 30, 100, 1000]],
    "oneDimensional": [{"m": m, "total": one_dim(m)[0], "stable": one_dim(m)[1]} for m in [0.5, 1.0, 2.0]],
}
OUT.write_text(json.dumps(out, indent=2) + "\n")
print(f"wrote {OUT}")
