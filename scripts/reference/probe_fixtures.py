"""Fixtures of the probe upload tests (tests/fixtures/probes) and reference statistics.

Re-run from the repository root:  python3 scripts/reference/probe_fixtures.py

- .npy files written by numpy.save (good: float64 and float32, C order; bad: complex, integer,
  Fortran order, big-endian, truncated), each good one with a JSON of the same matrix;
- CSV files: good ones written by numpy.savetxt, bad ones (ragged, non-numeric, NaN, infinity,
  a header row, not square, empty) written as literal text below;
- JSON of the hand-written Matrix Market files (*.mtx, written by hand following NISTIR 5935),
  read here with scipy.io.mmread as an independent reader;
- tests/reference/probe-stats.json: ĝ, τ̂, mean and diagonal statistics and the eigenvalues of a
  sampled 40 × 40 matrix (probe-40.npy, also the browser test's upload) computed with numpy.
Every JSON carries a "source" field naming the library and version that wrote it.
"""
import json
import pathlib

import numpy as np
import scipy
import scipy.io

ROOT = pathlib.Path(__file__).resolve().parents[2]
FIX = ROOT / "tests" / "fixtures" / "probes"
REF = ROOT / "tests" / "reference"
NP = f"numpy {np.__version__}"


def write_json(name: str, record: dict) -> None:
    (FIX / name).write_text(json.dumps(record, indent=1) + "\n")


def matrix_json(name: str, a: np.ndarray, source: str) -> None:
    write_json(name, {"source": source, "shape": list(a.shape), "rows": a.astype(np.float64).tolist()})


def npy_fixtures(rng: np.random.Generator) -> None:
    a64 = rng.normal(0.0, 0.5, size=(5, 5))
    np.save(FIX / "f64-5.npy", a64)
    matrix_json("f64-5.json", a64, f"{NP} numpy.save of default_rng(20240611).normal(0, 0.5, (5, 5)) as float64")
    a32 = rng.normal(0.0, 1.0, size=(4, 4)).astype(np.float32)
    np.save(FIX / "f32-4.npy", a32)
    matrix_json("f32-4.json", a32, f"{NP} numpy.save of a float32 4 x 4 matrix; values are the float32 numbers widened to float64")
    v = rng.normal(0.0, 0.2, size=5)
    np.save(FIX / "input-5.npy", v)
    write_json("input-5.json", {"source": f"{NP} numpy.save of a float64 vector of length 5", "shape": [5], "values": v.tolist()})
    np.save(FIX / "complex.npy", (a64 + 1j * a64).astype(np.complex128))
    np.save(FIX / "int.npy", np.arange(16, dtype=np.int64).reshape(4, 4))
    np.save(FIX / "fortran.npy", np.asfortranarray(a64))
    np.save(FIX / "big-endian.npy", a64.astype(">f8"))
    whole = (FIX / "f64-5.npy").read_bytes()
    (FIX / "truncated.npy").write_bytes(whole[:-7])


def csv_fixtures(rng: np.random.Generator) -> None:
    a = rng.normal(0.0, 1.0, size=(4, 4))
    np.savetxt(FIX / "good-4.csv", a, delimiter=",", fmt="%.17g")
    matrix_json("good-4.json", a, f"{NP} numpy.savetxt(delimiter=',', fmt='%.17g') of default_rng(20240611) draws")
    v = rng.normal(0.0, 0.3, size=(4, 1))
    np.savetxt(FIX / "input-4.csv", v, delimiter=",", fmt="%.17g")
    write_json("input-4.json", {"source": f"{NP} numpy.savetxt of a 4 x 1 column", "shape": [4], "values": v.ravel().tolist()})
    bad = {
        "ragged.csv": "1,2,3\n4,5,6\n7,8\n",
        "non-numeric.csv": "1,2,3\n4,five,6\n7,8,9\n",
        "nan.csv": "1,2,3\n4,5,NaN\n7,8,9\n",
        "inf.csv": "1,2,3\n4,5,6\n-inf,8,9\n",
        "header.csv": "a,b,c\n1,2,3\n4,5,6\n7,8,9\n",
        "not-square.csv": "1,2,3,4\n5,6,7,8\n9,10,11,12\n",
        "empty.csv": "",
    }
    for name, text in bad.items():
        (FIX / name).write_text(text)


def mtx_json() -> None:
    for name in ["coordinate-4", "array-3", "symmetric-3"]:
        m = scipy.io.mmread(FIX / f"{name}.mtx")
        dense = m.toarray() if hasattr(m, "toarray") else np.asarray(m)
        matrix_json(f"{name}.json", dense, f"scipy {scipy.__version__} scipy.io.mmread of the hand-written {name}.mtx")


def elliptic(rng: np.random.Generator, n: int, g: float, tau: float) -> np.ndarray:
    """J = (g/√N)(c_s S + c_a A), S = (G+Gᵀ)/√2, A = (H−Hᵀ)/√2 (science.md §2), with numpy draws."""
    G = rng.normal(size=(n, n))
    H = rng.normal(size=(n, n))
    S = (G + G.T) / np.sqrt(2)
    A = (H - H.T) / np.sqrt(2)
    return (g / np.sqrt(n)) * (np.sqrt((1 + tau) / 2) * S + np.sqrt((1 - tau) / 2) * A)


def stats_reference(rng: np.random.Generator) -> None:
    n, g, tau = 40, 1.5, 0.4
    J = elliptic(rng, n, g, tau)
    np.save(FIX / "probe-40.npy", J)
    off = J[~np.eye(n, dtype=bool)]
    iu = np.triu_indices(n, 1)
    x, y = J[iu], J.T[iu]
    d = np.diag(J)
    record = {
        "source": f"{NP}: numpy.var(ddof=1), numpy.corrcoef, numpy.mean/std(ddof=1) of probe-40.npy",
        "matrix": f"tests/fixtures/probes/probe-40.npy: elliptic rate couplings N={n}, g={g}, tau={tau}, default_rng(20240611)",
        "n": n,
        "gEstimate": float(np.sqrt(n * np.var(off, ddof=1))),
        "tauEstimate": float(np.corrcoef(x, y)[0, 1]),
        "offDiagonalMean": float(off.mean()),
        "offDiagonalSd": float(off.std(ddof=1)),
        "diagonalMean": float(d.mean()),
        "diagonalSd": float(d.std(ddof=1)),
        "rowSumMean": float(J.sum(axis=1).mean()),
        "frobenius": float(np.linalg.norm(J)),
        "eigenvaluesSource": f"{NP} numpy.linalg.eigvals, sorted by (real part, imaginary part)",
        "eigenvalues": [[float(w.real), float(w.imag)] for w in sorted(np.linalg.eigvals(J), key=lambda w: (w.real, w.imag))],
    }
    (REF / "probe-stats.json").write_text(json.dumps(record, indent=1) + "\n")


def main() -> None:
    FIX.mkdir(parents=True, exist_ok=True)
    rng = np.random.default_rng(20240611)
    npy_fixtures(rng)
    csv_fixtures(rng)
    mtx_json()
    stats_reference(rng)


if __name__ == "__main__":
    main()
