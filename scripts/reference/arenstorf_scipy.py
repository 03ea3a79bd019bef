#!/usr/bin/env python3
"""Step statistics of scipy's explicit Runge-Kutta codes on the Arenstorf orbit (HNW I, II.0),
for comparison with the engine's Dormand-Prince 5(4). Writes tests/reference/arenstorf-scipy.json.
Run: python3 scripts/reference/arenstorf_scipy.py"""
import json, numpy as np, scipy
from scipy.integrate import solve_ivp

MU = 0.012277471
T = 17.0652165601579625588917206249
Y0 = [0.994, 0.0, 0.0, -2.00158510637908252240537862224]


def f(_t, y):
    y1, y2, v1, v2 = y
    mup = 1 - MU
    d1 = ((y1 + MU) ** 2 + y2 ** 2) ** 1.5
    d2 = ((y1 - mup) ** 2 + y2 ** 2) ** 1.5
    return [v1, v2, y1 + 2 * v2 - mup * (y1 + MU) / d1 - MU * (y1 - mup) / d2,
            y2 - 2 * v1 - mup * y2 / d1 - MU * y2 / d2]


rows = []
for method in ["RK45", "DOP853"]:
    for tol in [1e-8, 1e-10]:
        s = solve_ivp(f, (0, T), Y0, method=method, rtol=tol, atol=tol)
        rows.append({"method": method, "rtol": tol, "atol": tol, "nfev": int(s.nfev),
                     "accepted": int(len(s.t) - 1),
                     "returnError": float(np.max(np.abs(s.y[:, -1] - np.array(Y0))))})
out = {"source": f"scipy {scipy.__version__} scipy.integrate.solve_ivp; scripts/reference/arenstorf_scipy.py", "runs": rows}
with open("tests/reference/arenstorf-scipy.json", "w") as fh:
    json.dump(out, fh, indent=1)
print(json.dumps(out))
