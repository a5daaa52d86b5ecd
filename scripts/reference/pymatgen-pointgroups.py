#!/usr/bin/python3
"""Record pymatgen's point group for ASE's G2 molecules and our fixture molecules.

Writes fixtures/reference/pymatgen-pointgroups.json, which the Vitest suite compares with our
detection. Settings follow the known traps of pymatgen 2022.11 (see the project's STACK notes):
tolerance 0.3 A, eigen_tolerance 0.001, and the group's order is checked against
len(get_pointgroup()) because the name alone can be wrong (hydrazine is called D2 with only
{E, C2}).

Run: /usr/bin/python3 scripts/reference/pymatgen-pointgroups.py
"""
import glob
import json
import os
import sys
from importlib.metadata import version

from ase.collections import g2
from pymatgen.core import Molecule
from pymatgen.symmetry.analyzer import PointGroupAnalyzer

from group_order import schoenflies_order

ROOT = os.path.join(os.path.dirname(os.path.abspath(__file__)), '..', '..')
OUT = os.path.join(ROOT, 'fixtures', 'reference', 'pymatgen-pointgroups.json')
TOLERANCE = 0.3
EIGEN_TOLERANCE = 0.001


def xyz_text(title, symbols, positions):
    lines = [str(len(symbols)), title]
    lines += [f'{s:<2} {p[0]:12.6f} {p[1]:12.6f} {p[2]:12.6f}' for s, p in zip(symbols, positions)]
    return '\n'.join(lines) + '\n'


def analyse(symbols, positions):
    pga = PointGroupAnalyzer(Molecule(symbols, positions), tolerance=TOLERANCE, eigen_tolerance=EIGEN_TOLERANCE)
    name = pga.sch_symbol
    ops = len(pga.get_pointgroup())
    expected = schoenflies_order(name)
    return name, ops, expected


def read_xyz(path):
    with open(path) as fh:
        lines = fh.read().splitlines()
    n = int(lines[0])
    symbols, positions = [], []
    for line in lines[2:2 + n]:
        f = line.split()
        symbols.append(f[0])
        positions.append([float(v) for v in f[1:4]])
    return lines[1], symbols, positions


def main():
    entries = []
    skipped = []
    for name in g2.names:
        atoms = g2[name]
        if len(atoms) < 2:
            skipped.append(name)
            continue
        symbols = atoms.get_chemical_symbols()
        positions = atoms.get_positions().tolist()
        pg, ops, expected = analyse(symbols, positions)
        entries.append({'source': 'ase-g2', 'name': name, 'xyz': xyz_text(f'{name} (ASE G2)', symbols, positions),
                        'pymatgen': pg, 'operations': ops, 'expectedOrder': expected})
    for path in sorted(glob.glob(os.path.join(ROOT, 'fixtures', 'molecules', '*.xyz'))):
        title, symbols, positions = read_xyz(path)
        if any(s in ('D', 'T') or s[0].isdigit() for s in symbols):
            # pymatgen compares species, not masses: an isotopologue is outside what it can judge.
            skipped.append(os.path.basename(path))
            continue
        pg, ops, expected = analyse(symbols, positions)
        with open(path) as fh:
            text = fh.read()
        entries.append({'source': 'fixtures/molecules', 'name': os.path.basename(path)[:-4], 'xyz': text,
                        'pymatgen': pg, 'operations': ops, 'expectedOrder': expected})
    result = {
        'tool': f'pymatgen {version("pymatgen")} PointGroupAnalyzer',
        'python': sys.version.split()[0],
        'ase': version('ase'),
        'command': '/usr/bin/python3 scripts/reference/pymatgen-pointgroups.py',
        'settings': {'tolerance': TOLERANCE, 'eigen_tolerance': EIGEN_TOLERANCE},
        'note': ('operations = len(get_pointgroup()); expectedOrder = order of the named group (null for linear). '
                 'Where they differ, pymatgen named a group the molecule does not have.'),
        'counts': {'g2Taken': sum(e['source'] == 'ase-g2' for e in entries),
                   'fixtures': sum(e['source'] != 'ase-g2' for e in entries), 'skipped': skipped},
        'molecules': entries,
    }
    with open(OUT, 'w') as fh:
        json.dump(result, fh, indent=1, ensure_ascii=False)
        fh.write('\n')
    bad = [e['name'] for e in entries if e['expectedOrder'] is not None and e['operations'] != e['expectedOrder']]
    print(f'{len(entries)} molecules written to {OUT}; order check failed for: {bad}')


if __name__ == '__main__':
    main()
