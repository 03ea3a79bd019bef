"""Writes tests/reference/npy-2x3.json: the exact bytes numpy.save gives for a small matrix,
used to check server/engine/io/npy-write.ts byte for byte. Run: python3 scripts/reference/npy_write_reference.py"""
import base64, io, json
import numpy as np

a = np.array([[1.5, -2.25, 3.0], [0.125, 1e-300, -7.0]], dtype="<f8")
buf = io.BytesIO()
np.save(buf, a)
with open("tests/reference/npy-2x3.json", "w") as f:
    json.dump({"source": f"numpy {np.__version__} numpy.save of the 2x3 float64 matrix below (scripts/reference/npy_write_reference.py)",
               "matrix": a.tolist(), "base64": base64.b64encode(buf.getvalue()).decode()}, f, indent=1)
