#!/usr/bin/env python3
"""Fixture of the engine CLI test (tests/fixtures/engine-cli/): a symmetric coupling matrix
J = g (G + G^T)/sqrt(2N) (N = 8, g = 2, seeded numpy draws), 12 start states, a constant input
vector, and files the reader must reject (int64 dtype, Fortran order, 3-D). Also writes
reference.json: the stable equilibria reached from each start by scipy's solve_ivp (RK45,
rtol 1e-9, t = 400) refined with scipy.optimize.fsolve (xtol 1e-13).
Run: python3 scripts/reference/make_cli_fixture.py"""
import json, os
import numpy as np, scipy
from scipy.integrate import solve_ivp
from scipy.optimize import fsolve

d = "tests/fixtures/engine-cli"
os.makedirs(d, exist_ok=True)
rng = np.random.default_rng(2024)
n, g, mu = 8, 2.0, 1.0
G = rng.standard_normal((n, n))
J = g * (G + G.T) / np.sqrt(2 * n)
X0 = 2.0 * rng.standard_normal((12, n))
I = 0.1 * rng.standard_normal(n)
np.save(f"{d}/J.npy", J)
np.save(f"{d}/X0.npy", X0)
np.save(f"{d}/X0_f4.npy", X0.astype("<f4"))
np.save(f"{d}/I.npy", I)
np.save(f"{d}/bad_int.npy", np.arange(n * n, dtype="<i8").reshape(n, n))
np.save(f"{d}/bad_fortran.npy", np.asfortranarray(J))
np.save(f"{d}/bad_3d.npy", np.zeros((2, 2, 2)))

F = lambda x: -mu * x + J @ np.tanh(x) + I
eqs = []
for x0 in X0:
    s = solve_ivp(lambda _t, x: F(x), (0, 400), x0, rtol=1e-9, atol=1e-12)
    x = fsolve(F, s.y[:, -1], xtol=1e-13)
    jac = -mu * np.eye(n) + J * (1 - np.tanh(x) ** 2)[None, :]
    if np.max(np.abs(F(x))) < 1e-10 and np.max(np.linalg.eigvals(jac).real) < 0:
        if not any(np.max(np.abs(x - e)) < 1e-6 for e in eqs):
            eqs.append(x)
ref = {"source": f"scipy {scipy.__version__} solve_ivp RK45 + optimize.fsolve, numpy {np.__version__}; scripts/reference/make_cli_fixture.py",
       "mu": mu, "stable": [e.tolist() for e in eqs]}
with open(f"{d}/reference.json", "w") as fh:
    json.dump(ref, fh, indent=1)
print(len(eqs), "stable equilibria")
