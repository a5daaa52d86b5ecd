#!/usr/bin/python3
"""Reference smoothing and peak picking from scipy.signal for the spectrum pipeline's tests.

Default mode: build deterministic synthetic signals (invented bands plus seeded noise, not
measurements), run savgol_filter (mode 'interp', scipy's default) and find_peaks /
peak_prominences / peak_widths, and write fixtures/reference/scipy-signals.json.

--stdin mode: read {"y": [...], "window": w, "polynomial": p, "threshold": t} as JSON on
standard input and print the same quantities for that signal, for the live test.

Run with Debian's interpreter, which sees python3-scipy:
    /usr/bin/python3 scripts/reference/scipy-signals.py
"""
import json
import os
import sys

import numpy as np
import scipy
from scipy.signal import find_peaks, peak_widths, savgol_filter

COMMAND = "/usr/bin/python3 scripts/reference/scipy-signals.py"
OUT = os.path.join(os.path.dirname(__file__), "..", "..", "fixtures", "reference", "scipy-signals.json")


def lorentzian(x, centre, height, fwhm):
    return height / (1.0 + ((x - centre) / (fwhm / 2.0)) ** 2)


def gaussian(x, centre, height, fwhm):
    return height * np.exp(-np.log(2.0) * ((x - centre) / (fwhm / 2.0)) ** 2)


def analyse(y, window, polynomial, threshold):
    """Smooth with savgol_filter, then pick peaks on the smoothed signal with scipy."""
    smoothed = savgol_filter(y, window, polynomial)
    indices, props = find_peaks(smoothed, height=threshold, prominence=threshold)
    widths = peak_widths(smoothed, indices, rel_height=0.5)[0] if len(indices) else np.array([])
    return {
        "smoothed": smoothed.tolist(),
        "indices": indices.tolist(),
        "heights": props["peak_heights"].tolist(),
        "prominences": props["prominences"].tolist(),
        "widthsPoints": widths.tolist(),
    }


def signals():
    """Deterministic synthetic signals (invented band lists, seeded noise)."""
    rng = np.random.RandomState(20261201)
    out = []
    x = np.arange(600.0, 2600.0 + 1e-9, 1.0)
    y = (lorentzian(x, 1028.3, 0.35, 10) + lorentzian(x, 1601.2, 0.30, 9) + lorentzian(x, 1715.0, 0.6, 20)
         + gaussian(x, 2349.0, 0.25, 14) + rng.normal(0.0, 0.003, x.size))
    out.append(("ir-like, 1 cm-1 grid", x, y, 9, 3, 0.03))
    x = np.arange(200.0, 1800.0 + 1e-9, 0.5)
    y = (lorentzian(x, 620.9, 160, 7) + lorentzian(x, 1001.4, 1000, 6) + lorentzian(x, 1031.8, 270, 7)
         + lorentzian(x, 1583.1, 120, 8) + lorentzian(x, 1602.3, 280, 9) + rng.normal(0.0, 5.0, x.size))
    out.append(("raman-like, 0.5 cm-1 grid", x, y, 17, 3, 40.0))
    x = np.arange(1000.0, 1400.0 + 1e-9, 1.0)
    y = (gaussian(x, 1150.0, 1.0, 16) + gaussian(x, 1168.0, 0.6, 12) + gaussian(x, 1250.0, 0.4, 30)
         + gaussian(x, 1300.0, 0.2, 8) + rng.normal(0.0, 0.01, x.size))
    out.append(("close doublet, 1 cm-1 grid", x, y, 11, 2, 0.08))
    return out


def main():
    if "--stdin" in sys.argv:
        request = json.load(sys.stdin)
        result = analyse(np.asarray(request["y"], dtype=float), request["window"], request["polynomial"], request["threshold"])
        json.dump(result, sys.stdout)
        return
    entries = []
    for name, x, y, window, polynomial, threshold in signals():
        result = analyse(y, window, polynomial, threshold)
        entries.append({
            "name": name,
            "x0": float(x[0]),
            "step": float(x[1] - x[0]),
            "y": y.tolist(),
            "window": window,
            "polynomial": polynomial,
            "threshold": threshold,
            **result,
        })
    document = {
        "note": "Synthetic signals (invented bands, seeded noise), not measurements. Reference values from scipy.signal.",
        "command": COMMAND,
        "scipyVersion": scipy.__version__,
        "numpyVersion": np.__version__,
        "functions": "savgol_filter(y, window, polynomial) in its default mode 'interp'; find_peaks(smoothed, height=threshold, prominence=threshold); peak_widths(rel_height=0.5)",
        "signals": entries,
    }
    with open(OUT, "w") as handle:
        json.dump(document, handle, indent=1)
        handle.write("\n")


if __name__ == "__main__":
    main()
