"""Exactly symmetric geometries for the MOPAC and NWChem reference runs.

G2 molecules come from ASE and are symmetrised by pymatgen (symmetrize_molecule), because both
programs label modes only as well as the input geometry is symmetric; our fixture molecules are
already exact (built as orbits by make-molecules.py).
"""
import os

from ase.collections import g2
from pymatgen.core import Molecule
from pymatgen.symmetry.analyzer import PointGroupAnalyzer

ROOT = os.path.join(os.path.dirname(os.path.abspath(__file__)), '..', '..')


def g2_symmetrised(name):
    """Symbols and symmetrised positions of one G2 molecule."""
    atoms = g2[name]
    mol = Molecule(atoms.get_chemical_symbols(), atoms.get_positions().tolist())
    pga = PointGroupAnalyzer(mol, tolerance=0.3, eigen_tolerance=0.001)
    sym = pga.symmetrize_molecule()['sym_mol']
    return [str(s.specie) for s in sym], [list(map(float, s.coords)) for s in sym]


def fixture(name):
    """Symbols and positions of one fixture molecule (fixtures/molecules/<name>.xyz)."""
    with open(os.path.join(ROOT, 'fixtures', 'molecules', name + '.xyz')) as fh:
        lines = fh.read().splitlines()
    n = int(lines[0])
    symbols, positions = [], []
    for line in lines[2:2 + n]:
        f = line.split()
        symbols.append(f[0])
        positions.append([float(v) for v in f[1:4]])
    return symbols, positions


def load(source, name):
    return g2_symmetrised(name) if source == 'ase-g2' else fixture(name)


def xyz_text(title, symbols, positions):
    lines = [str(len(symbols)), title]
    lines += [f'{s:<2} {p[0]:14.8f} {p[1]:14.8f} {p[2]:14.8f}' for s, p in zip(symbols, positions)]
    return '\n'.join(lines) + '\n'
