"""Writes brent-sequences.json: every point SciPy's bounded Brent minimizer (scipy.optimize.minimize_scalar,
method="bounded", Brent's localmin as in Forsythe, Malcolm & Moler 1977) evaluates on test functions written
with + - * / and abs only, so that Python and JavaScript compute them alike to the last bit.

Rerun with SciPy installed: python3 tests/unit/physics/reference/brent-sequences.py, then npx prettier --write on the file.
SciPy's xatol is 1.5 times the engine's tolerance: its step floor xatol/3 is the engine's tolerance/2.
"""
import json
import pathlib

import scipy
from scipy.optimize import minimize_scalar

CASES = [
    # name, body in the one syntax Python and JavaScript share, lo, hi, tolerance
    ("parabola", "(x - 0.3) * (x - 0.3)", 0, 1, 1e-6),
    ("kink", "abs(x - 0.7)", 0, 1, 1e-6),
    ("rising", "x", 2, 5, 1e-6),
    ("falling", "-x", 2, 5, 1e-6),
    ("quartic", "(x - 2) * (x - 2) * (x - 2) * (x - 2) + 0.5 * x", 0, 5, 1e-7),
    ("two minima", "x * x * (x - 3) * (x - 3) + x", -1, 4, 1e-6),
    ("reciprocal", "1 / x + x", 0.1, 5, 1e-6),
    ("flat bottom", "(x - 1) * (x - 1) * (x - 1) * (x - 1) * (x - 1) * (x - 1)", -2, 3, 1e-4),
    ("clearance-like", "0.002 * (x - 41.3) * (x - 41.3) - 0.00001 * (x - 41.3) * (x - 41.3) * (x - 41.3) + 12", 30, 90, 0.12),
]

cases = []
for name, body, lo, hi, tolerance in CASES:
    f = eval("lambda x: " + body)
    calls = []

    def recorded(x):
        calls.append(float(x))
        return f(x)

    result = minimize_scalar(recorded, bounds=(lo, hi), method="bounded", options={"xatol": 1.5 * tolerance, "maxiter": 10000})
    cases.append({"name": name, "body": body, "lo": lo, "hi": hi, "tolerance": tolerance, "calls": calls, "x": float(result.x)})

out = pathlib.Path(__file__).with_name("brent-sequences.json")
out.write_text(json.dumps({"generator": f"scipy {scipy.__version__}, minimize_scalar(method='bounded')", "cases": cases}, indent=1) + "\n")
print(f"wrote {out} ({len(cases)} cases)")
