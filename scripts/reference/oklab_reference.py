"""OKLab coordinates of a few sRGB colours, for tests/src/maps/map-lib.test.ts.

Follows Björn Ottosson, "A perceptual color space for image processing" (2020): sRGB transfer
function (IEC 61966-2-1), linear sRGB -> LMS (M1), cube root, -> Lab (M2), evaluated with numpy
in float64. Run: python3 scripts/reference/oklab_reference.py > tests/reference/oklab.json
"""
import json
import numpy as np

M1 = np.array([[0.4122214708, 0.5363325363, 0.0514459929],
               [0.2119034982, 0.6806995451, 0.1073969566],
               [0.0883024619, 0.2817188376, 0.6299787005]])
M2 = np.array([[0.2104542553, 0.7936177850, -0.0040720468],
               [1.9779984951, -2.4285922050, 0.4505937099],
               [0.0259040371, 0.7827717662, -0.8086757660]])

def to_linear(c):
    return np.where(c <= 0.04045, c / 12.92, ((c + 0.055) / 1.055) ** 2.4)

def oklab(hexstr):
    rgb = np.array([int(hexstr[i:i + 2], 16) / 255 for i in (1, 3, 5)])
    return (M2 @ np.cbrt(M1 @ to_linear(rgb))).tolist()

colours = ["#ffffff", "#000000", "#ff0000", "#00ff00", "#0000ff", "#2f7a8d", "#db6c2c", "#f4f1e9"]
print(json.dumps({
    "source": f"scripts/reference/oklab_reference.py with numpy {np.__version__} (Ottosson 2020 matrices, IEC 61966-2-1 transfer)",
    "colours": [{"hex": h, "lab": oklab(h)} for h in colours],
}, indent=2))
