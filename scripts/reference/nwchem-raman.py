#!/usr/bin/python3
"""Record NWChem's Raman activity per normal mode (HF/STO-3G, task dft raman) for small molecules.

The geometry is symmetrised first (pymatgen) and not optimised, so modes keep exact symmetry.
The Raman activities then split cleanly: symmetry-forbidden modes come out at or below 2e-6,
allowed ones at 0.1 and above. NWChem reports linear molecules in D4h/C4v (its largest
finite subgroup); the comparison uses counts of active and inactive modes, not labels.
Writes fixtures/reference/nwchem-raman.json.

Run: /usr/bin/python3 scripts/reference/nwchem-raman.py   (a few seconds per molecule)
"""
import json
import os
import re
import subprocess
import tempfile

from reference_molecules import ROOT, load, xyz_text

OUT = os.path.join(ROOT, 'fixtures', 'reference', 'nwchem-raman.json')
MOLECULES = ['H2O', 'NH3', 'CH4', 'CO2', 'BF3', 'C2H4', 'H2CO', 'HCN', 'C2H2']
RMINFO = re.compile(r'^rminfo\(\s*\d+\)=\(\s*(-?[\d.]+),\s*(-?[\d.Ee+-]+),')
SYMMETRY = re.compile(r'^\s*(\S+) symmetry detected')
VERSION = re.compile(r'Northwest Computational Chemistry Package \(NWChem\) (\S+)')

TEMPLATE = """start mol
title "{title}"
geometry units angstrom
{atoms}
end
basis
 * library sto-3g
end
dft
 xc HFexch 1.0
end
property
 response 1 0.0
end
task dft raman
"""


def run(name, symbols, positions):
    atoms = '\n'.join(f' {s} {p[0]:.8f} {p[1]:.8f} {p[2]:.8f}' for s, p in zip(symbols, positions))
    with tempfile.TemporaryDirectory() as tmp:
        path = os.path.join(tmp, 'mol.nw')
        with open(path, 'w') as fh:
            fh.write(TEMPLATE.format(title=name, atoms=atoms))
        done = subprocess.run(['nwchem', 'mol.nw'], cwd=tmp, capture_output=True, text=True, timeout=1800)
        return done.stdout


def parse(text):
    modes = []
    for line in text.splitlines():
        m = RMINFO.match(line)
        if m:
            modes.append({'frequencyCm1': float(m.group(1)), 'ramanActivity': float(m.group(2))})
    if not modes:
        raise RuntimeError('NWChem printed no Raman data')
    group = next((m.group(1) for m in map(SYMMETRY.match, text.splitlines()) if m), None)
    version = VERSION.search(text)
    return group, (version.group(1) if version else None), modes


def main():
    entries = []
    version = None
    for name in MOLECULES:
        symbols, positions = load('ase-g2', name)
        group, version, modes = parse(run(name, symbols, positions))
        entries.append({'source': 'ase-g2', 'name': name,
                        'xyz': xyz_text(f'{name} (exactly symmetric input to NWChem)', symbols, positions),
                        'nwchemSymmetry': group, 'modes': modes})
        print(f'{name:8s} {group} {len(modes)} modes', flush=True)
    result = {
        'tool': f'NWChem {version}', 'command': '/usr/bin/python3 scripts/reference/nwchem-raman.py',
        'method': 'HF/STO-3G (dft with HFexch 1.0), static polarisability (response 1 0.0), task dft raman',
        'thresholds': {'inactiveAtMost': 2e-6, 'activeAtLeast': 0.1},
        'note': 'ramanActivity in A^4/amu as printed in the rminfo lines; one entry per mode, degenerate modes repeated.',
        'molecules': entries,
    }
    with open(OUT, 'w') as fh:
        json.dump(result, fh, indent=1)
        fh.write('\n')


if __name__ == '__main__':
    main()
