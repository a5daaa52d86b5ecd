#!/usr/bin/python3
"""Record MOPAC's point group, mode irreps and IR transition dipoles for exactly symmetric molecules.

Keywords PM7 PRECISE FORCE LET: FORCE computes the Hessian at the given geometry without
optimising it, so the symmetry stays exact. PM7 frequencies are not band positions; only the
labels and the zero/non-zero transition dipoles are used as a reference.
Writes fixtures/reference/mopac-modes.json.

Run: /usr/bin/python3 scripts/reference/mopac-modes.py   (about a minute; C60 takes longest)
"""
import json
import os
import re
import subprocess
import tempfile

from reference_molecules import ROOT, load, xyz_text

OUT = os.path.join(ROOT, 'fixtures', 'reference', 'mopac-modes.json')
KEYWORDS = 'PM7 PRECISE FORCE LET'

MOLECULES = [
    ('ase-g2', n, 0) for n in ['H2O', 'NH3', 'CH4', 'BF3', 'C6H6', 'C2H4', 'CO2', 'HCN', 'C2H2', 'H2CCl2', 'H2CO',
                               'CH3Cl', 'SO2', 'CH3OH', 'H2O2', 'C2H6', 'SiF4', 'PF3', 'COF2', 'C3H4_D2d',
                               'C3H6_D3h', 'C2F4', 'NCCN', 'N2O', 'CF4']
] + [
    ('fixtures/molecules', n, 0) for n in ['xef4', 'pcl5', 'sf6', 'cubane', 's8', 'boric-acid', 'cyclohexane-chair',
                                           'dichloroethene-trans', 'brf5', 'bromochlorofluoromethane',
                                           'dichlorodifluoroethane-meso', 'ethane-twisted', 'biphenyl-twisted',
                                           'adamantane', 'c60']
] + [('fixtures/molecules', 'cyclopentadienide', -1), ('fixtures/molecules', 'b12h12', -2),
     ('fixtures/molecules', 'mg-hexaaqua', 2)]

VIBRATION = re.compile(r'^\s*VIBRATION\s+(\d+)\s+\d+(\S+)')
DIPOLE = re.compile(r'^\s*TRANSITION DIPOLE\s+(-?\d+\.\d+)')
FREQUENCY = re.compile(r'^\s*FREQUENCY\s+(-?\d+\.\d+)')
GROUP = re.compile(r'MOLECULAR POINT GROUP\s*:\s*(\S+)')
VERSION = re.compile(r'MOPAC v(\S+)')


def run(symbols, positions, charge, title):
    with tempfile.TemporaryDirectory() as tmp:
        keys = KEYWORDS + (f' CHARGE={charge}' if charge else '')
        lines = [keys, title, '']
        lines += [f'{s} {p[0]:.8f} 0 {p[1]:.8f} 0 {p[2]:.8f} 0' for s, p in zip(symbols, positions)]
        path = os.path.join(tmp, 'mol.mop')
        with open(path, 'w') as fh:
            fh.write('\n'.join(lines) + '\n')
        subprocess.run(['mopac', path], check=True, capture_output=True, timeout=1800)
        with open(os.path.join(tmp, 'mol.out')) as fh:
            return fh.read(), keys


def parse(text):
    group = GROUP.search(text)
    version = VERSION.search(text)
    modes = []
    for line in text.splitlines():
        m = VIBRATION.match(line)
        if m:
            modes.append({'index': int(m.group(1)), 'irrep': m.group(2)})
            continue
        m = FREQUENCY.match(line)
        if m and modes and 'frequencyCm1' not in modes[-1]:
            modes[-1]['frequencyCm1'] = float(m.group(1))
            continue
        m = DIPOLE.match(line)
        if m and modes and 'transitionDipole' not in modes[-1]:
            d = float(m.group(1))
            modes[-1]['transitionDipole'] = d
            modes[-1]['irActive'] = d > 0
    if 'JOB ENDED NORMALLY' not in text:
        raise RuntimeError('MOPAC did not end normally')
    return (group.group(1) if group else None), (version.group(1) if version else None), modes


def main():
    entries = []
    version = None
    for source, name, charge in MOLECULES:
        symbols, positions = load(source, name)
        text, keys = run(symbols, positions, charge, name)
        group, version, modes = parse(text)
        entries.append({'source': source, 'name': name, 'charge': charge, 'keywords': keys,
                        'xyz': xyz_text(f'{name} (exactly symmetric input to MOPAC)', symbols, positions),
                        'pointGroup': group, 'modes': modes})
        print(f'{name:30s} {group:6s} {len(modes):3d} modes', flush=True)
    result = {
        'tool': f'MOPAC {version}', 'command': '/usr/bin/python3 scripts/reference/mopac-modes.py',
        'keywords': KEYWORDS,
        'note': ('irrep = MOPAC label in its own axis choice; irActive = transition dipole > 0. In D4h and D6h MOPAC '
                 'takes the other class of C2\'/sigma_v as the reference for B1/B2 than the usual tables, and it '
                 'writes primes as \' and ".'),
        'molecules': entries,
    }
    with open(OUT, 'w') as fh:
        json.dump(result, fh, indent=1, ensure_ascii=False)
        fh.write('\n')


if __name__ == '__main__':
    main()
