#!/usr/bin/env python3
"""Reference for the engine benchmark: 32 starts of dx/dt = -mu x + J tanh(x) (+ I) integrated with
scipy's RK45 (solve_ivp's Dormand-Prince 5(4) stepper, scipy.integrate.RK45) at rtol 1e-6,
atol 1e-9, t <= 200, stopping each run when ||dx/dt||_inf < 1e-5 (the engine's stillness test),
then Newton refinement (numpy.linalg.solve) of each still state and merging of equilibria by
||x - y||_inf <= 1e-6 max(1, ||x||_inf). Prints the wall time and the counts, and with --write
saves J.npy and X0.npy (seeded numpy draws) for `npm run bench:engine -- --couplings ... --starts ...`.

Usage: python3 scripts/reference/scipy_rk45_cell.py [--n 100] [--g 2] [--starts 32] [--seed 1]
       [--dir /tmp/eqb] [--write] [--couplings J.npy --starts-file X0.npy] [--out result.json]
"""
import argparse, json, time, os
import numpy as np
from scipy.integrate import RK45


def run(J, X0, mu, I, rtol, atol, tmax, still):
    n = J.shape[0]
    f = lambda _t, x: -mu * x + J @ np.tanh(x) + I
    eqs, runs, nfev = [], {"settled": 0, "unsettled": 0, "escaped": 0}, 0
    for x0 in X0:
        s = RK45(f, 0.0, x0.copy(), tmax, rtol=rtol, atol=atol)
        while s.status == "running":
            s.step()
            if not np.all(np.isfinite(s.y)):
                break
            if np.max(np.abs(s.f)) < still:  # s.f is F(y) at the accepted point (FSAL)
                break
        nfev += s.nfev
        if not np.all(np.isfinite(s.y)):
            runs["escaped"] += 1
            continue
        if np.max(np.abs(s.f)) >= still:
            runs["unsettled"] += 1
            continue
        x = s.y.copy()
        for _ in range(50):
            F = f(0, x)
            if np.max(np.abs(F)) < 1e-13:
                break
            Jac = -mu * np.eye(n) + J * (1 - np.tanh(x) ** 2)[None, :]
            x = x - np.linalg.solve(Jac, F)
        if np.max(np.abs(f(0, x))) < 1e-10:
            runs["settled"] += 1
            if not any(np.max(np.abs(x - e)) <= 1e-6 * max(1, np.max(np.abs(x))) for e in eqs):
                eqs.append(x)
        else:
            runs["unsettled"] += 1
    return eqs, runs, nfev


def main():
    p = argparse.ArgumentParser()
    p.add_argument("--n", type=int, default=100)
    p.add_argument("--g", type=float, default=2.0)
    p.add_argument("--mu", type=float, default=1.0)
    p.add_argument("--starts", type=int, default=32)
    p.add_argument("--seed", type=int, default=1)
    p.add_argument("--dir", default="/tmp/equilibrist-bench")
    p.add_argument("--write", action="store_true")
    p.add_argument("--couplings")
    p.add_argument("--starts-file")
    p.add_argument("--out")
    a = p.parse_args()
    if a.couplings:
        J, X0 = np.load(a.couplings), np.load(a.starts_file)
    else:
        rng = np.random.default_rng(a.seed)
        J = rng.standard_normal((a.n, a.n)) * a.g / np.sqrt(a.n)
        X0 = rng.standard_normal((a.starts, a.n))
    if a.write:
        os.makedirs(a.dir, exist_ok=True)
        np.save(os.path.join(a.dir, "J.npy"), J)
        np.save(os.path.join(a.dir, "X0.npy"), X0)
    t0, c0 = time.perf_counter(), time.process_time()
    eqs, runs, nfev = run(J, X0, a.mu, np.zeros(J.shape[0]), 1e-6, 1e-9, 200.0, 1e-5)
    wall, cpu = time.perf_counter() - t0, time.process_time() - c0
    res = {"source": f"scipy {__import__('scipy').__version__} RK45, numpy {np.__version__}",
           "n": int(J.shape[0]), "starts": int(X0.shape[0]), "wallSeconds": wall, "cpuSeconds": cpu,
           "evaluations": int(nfev), "distinct": len(eqs), "runs": runs}
    print(json.dumps(res))
    if a.out:
        with open(a.out, "w") as fh:
            json.dump(res, fh)


if __name__ == "__main__":
    main()
