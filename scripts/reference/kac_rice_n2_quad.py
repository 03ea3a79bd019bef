"""Exact E N_tot of the field network at N = 2 by direct numerical integration (scipy), with no
use of the real-eigenvalue density formula.

With sigma = 1, e = (1-tau)/2, alpha = 1+e, gamma = tau-e (science.md section 1 covariance), the
four Gaussian coordinates s = (J11+J22)/sqrt2, q = (J11-J22)/sqrt2, u = (J12+J21)/sqrt2,
v = (J12-J21)/sqrt2 are independent with variances 1+3tau-2e, 1+tau, alpha+gamma, alpha-gamma, and
det(mu - J) = (mu - s/sqrt2)^2 - q^2/2 - u^2/2 + v^2/2. The v-average of |c + v^2/2| is done in
closed form (normal moments truncated at |v| < sqrt(-2c)); u, q and s by scipy.integrate.quad
(nested), each over +-12 standard deviations (a coordinate of zero variance is held at 0). E N_tot = E|det| / mu^2, mu = m sqrt(2).
Writes tests/reference/kac-rice-n2-quad.json. Re-run: python3 scripts/reference/kac_rice_n2_quad.py
"""
import json
import math
import pathlib

import scipy
from scipy import integrate, special

OUT = pathlib.Path(__file__).resolve().parents[2] / "tests" / "reference" / "kac-rice-n2-quad.json"
OPTS = dict(epsabs=1e-11, epsrel=1e-10, limit=200)


def gauss(x, sd):
    return math.exp(-0.5 * (x / sd) ** 2) / (sd * math.sqrt(2 * math.pi))


def abs_v(c, sv):
    """E|c + v^2/2| for v ~ N(0, sv^2)."""
    if sv == 0:
        return abs(c)
    mean = c + sv * sv / 2
    if c >= 0:
        return mean
    r = math.sqrt(-2 * c) / sv
    p = special.erf(r / math.sqrt(2))
    trunc_v2 = sv * sv * (p - 2 * r * math.exp(-r * r / 2) / math.sqrt(2 * math.pi))
    return mean - 2 * (c * p + trunc_v2 / 2)


def total(tau, m):
    n = 2
    e = (1 - tau) / n
    alpha, gamma = 1 + e, tau - e
    ss, sq, su, sv = (math.sqrt(x) for x in (1 + 3 * tau - 2 * e, 1 + tau, alpha + gamma, alpha - gamma))
    mu = m * math.sqrt(n)

    def over_u(a):
        f = lambda u: gauss(u, su) * abs_v(a - u * u / 2, sv)
        kink = math.sqrt(max(2 * a, 0.0))
        pts = [kink] if 0 < kink < 12 * su else None
        return 2 * integrate.quad(f, 0, 12 * su, points=pts, **OPTS)[0]

    def over_q(s):
        b = (mu - s / math.sqrt(2)) ** 2
        f = lambda q: gauss(q, sq) * over_u(b - q * q / 2)
        return 2 * integrate.quad(f, 0, 12 * sq, **OPTS)[0]

    if ss == 0:  # tau = 0: the trace is exactly 0
        return over_q(0.0) / mu**n
    f = lambda s: gauss(s, ss) * over_q(s)
    val = integrate.quad(f, -12 * ss, 12 * ss, points=[mu * math.sqrt(2)], **OPTS)[0]
    return val / mu**n


cases = [(0.0, 0.5), (0.0, 1.0), (0.5, 0.5), (0.5, 1.5), (1.0, 1.0), (0.3, 0.5), (0.6, 1.0)]
rows = []
for tau, m in cases:
    rows.append({"N": 2, "tau": tau, "m": m, "total": total(tau, m)})
    print(rows[-1], flush=True)
OUT.write_text(json.dumps({
    "source": f"scripts/reference/kac_rice_n2_quad.py, scipy {scipy.__version__} scipy.integrate.quad nested over the "
    "Gaussian coordinates of J with the last one in closed form (no real-eigenvalue density formula)",
    "rows": rows,
}, indent=2) + "\n")
print(f"wrote {OUT}")
