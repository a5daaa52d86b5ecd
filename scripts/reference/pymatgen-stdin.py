#!/usr/bin/python3
"""pymatgen's point group for molecules given as JSON on stdin; prints JSON on stdout.

Input:  [{"name": str, "symbols": [str], "positions": [[x, y, z], ...], "repeats"?: int}, ...]
Output: [{"name": str, "pointGroup": str, "operations": int, "seconds": float}, ...]
seconds is the median wall time of `repeats` (per molecule, else argv[1], default 1) analyses, timed inside Python
so that process start-up is not counted. Settings as in pymatgen-pointgroups.py.
Used by the live Vitest check and by scripts/bench/symmetry.mjs.
"""
import json
import statistics
import sys
import time
import warnings

from pymatgen.core import Molecule
from pymatgen.symmetry.analyzer import PointGroupAnalyzer


def main():
    repeats = int(sys.argv[1]) if len(sys.argv) > 1 else 1
    warnings.simplefilter('ignore')
    out = []
    for m in json.load(sys.stdin):
        mol = Molecule(m['symbols'], m['positions'])
        times = []
        for _ in range(m.get('repeats', repeats)):
            t0 = time.perf_counter()
            pga = PointGroupAnalyzer(mol, tolerance=0.3, eigen_tolerance=0.001)
            name = pga.sch_symbol
            times.append(time.perf_counter() - t0)
        out.append({'name': m['name'], 'pointGroup': name, 'operations': len(pga.get_pointgroup()),
                    'seconds': statistics.median(times)})
    json.dump(out, sys.stdout)


if __name__ == '__main__':
    main()
