"""Reference eigenvalues for tests/server/engine/spectra: fixed random matrices and their
eigenvalues computed with numpy.linalg.eigvals (LAPACK dgeev).

Re-run from the repository root:  python3 scripts/reference/eigen_reference.py
Writes tests/reference/eigen-<name>.json with the matrix entries (row-major), the eigenvalues
and a "source" field naming the library and version.
"""
import json
import pathlib

import numpy as np

OUT = pathlib.Path(__file__).resolve().parents[2] / "tests" / "reference"


def write(name: str, a: np.ndarray, seed: int, kind: str) -> None:
    w = np.linalg.eigvals(a)
    record = {
        "source": f"numpy {np.__version__} numpy.linalg.eigvals",
        "matrix": f"{kind}, numpy.random.default_rng({seed})",
        "n": int(a.shape[0]),
        "a": [float(v) for v in a.ravel()],
        "re": [float(v) for v in w.real],
        "im": [float(v) for v in w.imag],
    }
    (OUT / f"eigen-{name}.json").write_text(json.dumps(record, indent=1) + "\n")


def main() -> None:
    OUT.mkdir(parents=True, exist_ok=True)
    write("12", np.random.default_rng(12).standard_normal((12, 12)), 12, "12x12 iid standard normal")
    write("60", np.random.default_rng(60).standard_normal((60, 60)), 60, "60x60 iid standard normal")
    g = np.random.default_rng(40).standard_normal((40, 40))
    write("sym-40", (g + g.T) / np.sqrt(2), 40, "40x40 (G + G^T)/sqrt(2), G iid standard normal")
    # Graded matrix: entries scaled by 10^(±3) across rows and columns (tests scaling robustness).
    d = 10.0 ** np.linspace(-3, 3, 20)
    write("graded-20", np.diag(d) @ np.random.default_rng(20).standard_normal((20, 20)) @ np.diag(1 / d), 20,
          "20x20 D G D^-1, G iid standard normal, D = diag(10^linspace(-3, 3, 20))")


if __name__ == "__main__":
    main()
