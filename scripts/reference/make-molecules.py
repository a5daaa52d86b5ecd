#!/usr/bin/python3
"""Write the idealised test geometries in fixtures/molecules/*.xyz.

Every molecule is built as the orbit of a few representative atoms under the exact operations
of its point group (point_group_orbits.py), so the files have exact symmetry
up to the 6 printed decimals. The XYZ comment line reads
    <name>; group=<Schoenflies>; <where the geometry comes from>
Bond lengths and angles are approximate literature values recalled from memory (marked so);
"synthetic" frameworks are invented point sets that exist only to exercise a group.

Run: /usr/bin/python3 scripts/reference/make-molecules.py
"""
import math
import os

import numpy as np

from point_group_orbits import PHI, axis_rotation, cyl, orbit_atoms, puckered_ring, ring_r

OUT = os.path.join(os.path.dirname(os.path.abspath(__file__)), '..', '..', 'fixtures', 'molecules')


def molecules():
    m = {}
    MEM = 'bond lengths from memory (approximate gas-phase values)'
    m['sf6'] = ('Oh', [('S', (0, 0, 0)), ('F', (1.561, 0, 0))], 'S-F 1.561 A; ' + MEM)
    t = 1.571 / 2
    h = t + 1.097 / math.sqrt(3)
    m['cubane'] = ('Oh', [('C', (t, t, t)), ('H', (h, h, h))], 'C-C 1.571, C-H 1.097 A; ' + MEM)
    m['c60'] = ('Ih', [('C', tuple(0.71 * np.array([0, 1, 3 * PHI])))],
                'truncated icosahedron with equal edges 1.42 A (idealised; real C60 has 1.40/1.45 A bonds, from memory)')
    s = 1.78 / 2
    m['b12h12'] = ('Ih', [('B', tuple(s * np.array([0, 1, PHI]))),
                          ('H', tuple((s * math.hypot(1, PHI) + 1.20) * np.array([0, 1, PHI]) / math.hypot(1, PHI)))],
                   'closo-dodecaborate dianion, B-B 1.78, B-H 1.20 A; ' + MEM)
    c = 1.767 / math.sqrt(3)
    m['ccl4'] = ('Td', [('C', (0, 0, 0)), ('Cl', (c, c, c))], 'C-Cl 1.767 A; ' + MEM)
    p = 2.21 / (2 * math.sqrt(2))
    m['p4'] = ('Td', [('P', (p, p, p))], 'white phosphorus, P-P 2.21 A; ' + MEM)
    # Adamantane: CH carbons on the body diagonals, CH2 carbons on the axes (C-C 1.54, C-H 1.09, from memory).
    cx, tt = 1.78, 0.887
    hh = 1.09 * math.sin(math.radians(54.75)) / math.sqrt(2)
    m['adamantane'] = ('Td', [('C', (tt, tt, tt)), ('C', (cx, 0, 0)),
                              ('H', tuple(np.array([tt, tt, tt]) * (1 + 1.09 / (tt * math.sqrt(3))))),
                              ('H', (cx + 1.09 * math.cos(math.radians(54.75)), hh, -hh))],
                   'C-C about 1.54, C-H 1.09 A; ' + MEM)
    # Neopentane with every methyl turned 30 degrees off staggered: Td falls to T.
    d = 1.54 / math.sqrt(3)
    axis = np.array([1, 1, 1]) / math.sqrt(3)
    # (1, -1, 0) is normal to the x = y mirror, so it lies 30 degrees from the nearest Td mirror plane.
    perp = np.array([1, -1, 0]) / math.sqrt(2)
    hpos = np.array([d, d, d]) + 1.09 * (math.cos(math.radians(70.5)) * axis
                                          + math.sin(math.radians(70.5)) * perp)
    m['neopentane-twisted'] = ('T', [('C', (0, 0, 0)), ('C', (d, d, d)), ('H', tuple(hpos))],
                               'synthetic conformer: neopentane (C-C 1.54, C-H 1.09 A, from memory) with methyls turned 30 degrees')
    m['mg-hexaaqua'] = ('Th', [('Mg', (0, 0, 0)), ('O', (2.07, 0, 0)), ('H', (2.07 + 0.587, 0.759, 0))],
                        'hexaaquamagnesium(2+) with coplanar water pairs; Mg-O 2.07, O-H 0.96 A, HOH 104.5 deg; ' + MEM)
    m['synthetic-o'] = ('O', [('C', (1.6, 0.8, 0.3)), ('N', (0, 0, 0))], 'synthetic framework for the O group')
    m['synthetic-i'] = ('I', [('C', (2.9, 1.2, 0.9))], 'synthetic framework for the I group')
    m['synthetic-s4'] = ('S4', [('C', (1.2, 0.35, 0.5)), ('H', (1.9, 1.1, 0.9)), ('Si', (0, 0, 0))],
                         'synthetic framework for the S4 group')
    m['synthetic-s6'] = ('S6', [('C', (1.3, 0.3, 0.45)), ('H', (2.0, 1.0, 0.8))], 'synthetic framework for the S6 group')
    m['synthetic-s8'] = ('S8', [('C', (1.6, 0.3, 0.4)), ('H', (2.4, 0.9, 0.7))], 'synthetic framework for the S8 group')
    m['boric-acid'] = ('C3h', [('B', (0, 0, 0)), ('O', (1.36, 0, 0)), ('H', (1.36 + 0.379, 0.893, 0))],
                       'B(OH)3, B-O 1.36, O-H 0.97 A, BOH 113 deg; ' + MEM)
    m['synthetic-c4h'] = ('C4h', [('C', (1.4, 0, 0)), ('C', (2.3, 0.9, 0)), ('Cl', (3.6, 0.7, 0))],
                          'synthetic planar pinwheel for the C4h group')
    m['synthetic-c6h'] = ('C6h', [('C', (1.4, 0, 0)), ('C', (2.4, 0.6, 0)), ('O', (3.3, 0.1, 0))],
                          'synthetic planar pinwheel for the C6h group')
    rs8, hs8 = puckered_ring(8, 2.05, 108.0)
    m['s8'] = ('D4d', [('S', cyl(rs8, 22.5, hs8))], 'cyclo-octasulfur crown, S-S 2.05 A, SSS 108 deg; ' + MEM)
    rcp = ring_r(5, 1.43)
    zcp = math.sqrt(2.06 ** 2 - rcp ** 2)
    m['ferrocene-eclipsed'] = ('D5h', [('Fe', (0, 0, 0)), ('C', (rcp, 0, zcp)), ('H', (rcp + 1.08, 0, zcp))],
                               'Fe-C 2.06, C-C 1.43, C-H 1.08 A; ' + MEM)
    m['ferrocene-staggered'] = ('D5d', [('Fe', (0, 0, 0)), ('C', cyl(rcp, 18, zcp)), ('H', cyl(rcp + 1.08, 18, zcp))],
                                'Fe-C 2.06, C-C 1.43, C-H 1.08 A; ' + MEM)
    m['cyclopentadienide'] = ('D5h', [('C', (rcp - 0.02, 0, 0)), ('H', (rcp - 0.02 + 1.08, 0, 0))],
                              'C5H5(-), C-C 1.40, C-H 1.08 A; ' + MEM)
    rc6, hc6 = puckered_ring(6, 1.535, 111.4)
    cax = np.array(cyl(rc6, 30, hc6))
    radial = np.array(cyl(1, 30, 0))
    heq = cax + 1.09 * (math.cos(math.radians(19.5)) * radial - math.sin(math.radians(19.5)) * np.array([0, 0, 1]))
    m['cyclohexane-chair'] = ('D3d', [('C', tuple(cax)), ('H', tuple(cax + np.array([0, 0, 1.09]))), ('H', tuple(heq))],
                              'chair, C-C 1.535, C-H 1.09 A, CCC 111.4 deg; ' + MEM)
    r8 = ring_r(8, 1.40)
    m['uranocene'] = ('D8h', [('U', (0, 0, 0)), ('C', (r8, 0, 1.93)), ('H', (r8 + 1.08, 0, 1.93))],
                      'U(C8H8)2, U-ring centroid 1.93, C-C 1.40, C-H 1.08 A; ' + MEM)
    m['xef4'] = ('D4h', [('Xe', (0, 0, 0)), ('F', (1.95, 0, 0))], 'Xe-F 1.95 A; ' + MEM)
    m['pcl5'] = ('D3h', [('P', (0, 0, 0)), ('Cl', (0, 0, 2.14)), ('Cl', (2.02, 0, 0))],
                 'P-Cl axial 2.14, equatorial 2.02 A; ' + MEM)
    m['brf5'] = ('C4v', [('Br', (0, 0, 0)), ('F', (0, 0, 1.69)), ('F', (1.763, 0, 0.160))],
                 'Br-F axial 1.69, basal 1.77 A, F(ax)-Br-F(bas) 84.8 deg; ' + MEM)
    m['cyclopentadienyl-lithium'] = ('C5v', [('C', (rcp - 0.02, 0, 0)), ('H', (rcp - 0.02 + 1.08, 0, 0)), ('Li', (0, 0, 1.80))],
                                     'CpLi monomer, ring as C5H5(-), Li 1.80 A above the ring centre; ' + MEM)
    r6 = ring_r(6, 1.397)
    m['benzene-argon'] = ('C6v', [('C', (r6, 0, 0)), ('H', (r6 + 1.084, 0, 0)), ('Ar', (0, 0, 3.58))],
                          'benzene (C-C 1.397, C-H 1.084 A) with Ar 3.58 A above the ring centre; ' + MEM)
    m['cyclooctatetraenide'] = ('D8h', [('C', (r8, 0, 0)), ('H', (r8 + 1.08, 0, 0))],
                                'C8H8(2-), C-C 1.40, C-H 1.08 A; ' + MEM)
    # Allene: C=C 1.308, C-H 1.087 A, HCH 118.2 deg (from memory); CH2 planes crossed.
    hz = 1.308 + 1.087 * math.cos(math.radians(59.1))
    hx = 1.087 * math.sin(math.radians(59.1)) / math.sqrt(2)
    m['allene'] = ('D2d', [('C', (0, 0, 0)), ('C', (0, 0, 1.308)), ('H', (hx, hx, hz))],
                   'C=C 1.308, C-H 1.087 A, HCH 118.2 deg; ' + MEM)
    # Biphenyl twisted 44 degrees: D2 (inter-ring bond 1.49, C-C 1.39, C-H 1.08 A, from memory).
    ring_dir = np.array([math.cos(math.radians(22)), math.sin(math.radians(22)), 0])
    z0 = 1.49 / 2
    centre = z0 + 1.39
    def ringpos(angle, rad):
        a = math.radians(angle)
        return tuple(np.array([0, 0, centre]) + rad * (math.sin(a) * ring_dir - math.cos(a) * np.array([0, 0, 1])))
    m['biphenyl-twisted'] = ('D2', [('C', ringpos(0, 1.39)), ('C', ringpos(60, 1.39)), ('C', ringpos(120, 1.39)),
                                    ('C', ringpos(180, 1.39)), ('H', ringpos(60, 2.47)), ('H', ringpos(120, 2.47)),
                                    ('H', ringpos(180, 2.47))],
                             'rings twisted 44 deg, C-C 1.39, inter-ring 1.49, C-H 1.08 A; ' + MEM)
    # Ethane twisted 20 degrees from eclipsed: D3.
    m['ethane-twisted'] = ('D3', [('C', (0, 0, 0.768)), ('H', cyl(1.023, 10, 0.768 + 0.363))],
                           'synthetic conformer: C-C 1.536, C-H 1.091 A (from memory), torsion 20 deg')
    # 1,1,1-trichloroethane twisted 25 degrees from staggered: C3.
    m['trichloroethane-twisted'] = ('C3', [('C', (0, 0, 0)), ('C', (0, 0, 1.54)), ('Cl', cyl(1.67, 0, -0.59)),
                                           ('H', cyl(1.03, 85, 1.54 + 0.36))],
                                    'synthetic conformer: C-C 1.54, C-Cl 1.77, C-H 1.09 A (from memory), methyl turned 25 deg')
    # meso-1,2-dichloro-1,2-difluoroethane, anti conformer: Ci.
    m['dichlorodifluoroethane-meso'] = ('Ci', [('C', (0.77, 0, 0)), ('H', (1.13, 0.0, 1.03)), ('F', (1.2, 1.2, -0.5)),
                                               ('Cl', (1.35, -1.45, -0.75))],
                                        'meso anti conformer, approximate tetrahedral geometry (synthetic coordinates)')
    m['dichloroethene-trans'] = ('C2h', [('C', (0.665, 0, 0)), ('H', (1.21, 0.94, 0)), ('Cl', (1.5, -1.45, 0))],
                                 'trans-ClHC=CHCl, C=C 1.33, C-Cl 1.73, C-H 1.08 A; ' + MEM)
    m['bromochlorofluoromethane'] = ('C1', [('C', (0, 0, 0)), ('H', (0.63, 0.63, 0.63)), ('F', (-0.78, -0.78, 0.78)),
                                            ('Cl', (-1.02, 1.02, -1.02)), ('Br', (1.12, -1.12, -1.12))],
                                     'CHFClBr on an ideal tetrahedron, C-H 1.09, C-F 1.35, C-Cl 1.77, C-Br 1.94 A; ' + MEM)
    return m


def main():
    os.makedirs(OUT, exist_ok=True)
    for name, (group, reps, note) in sorted(molecules().items()):
        atoms = orbit_atoms(group, reps)
        lines = [str(len(atoms)), f'{name}; group={group}; {note}']
        lines += [f'{el:<2} {p[0]:12.6f} {p[1]:12.6f} {p[2]:12.6f}' for el, p in atoms]
        with open(os.path.join(OUT, name + '.xyz'), 'w') as fh:
            fh.write('\n'.join(lines) + '\n')
        print(f'{name:32s} {group:5s} {len(atoms):4d} atoms')
    # The isotopologue is written by hand: D breaks the Td of methane down to C3v.
    c = 1.087 / math.sqrt(3)
    with open(os.path.join(OUT, 'ch3d.xyz'), 'w') as fh:
        fh.write('5\nch3d; group=C3v; CH3D on an ideal tetrahedron, C-H 1.087 A (from memory)\n'
                 f'C  0 0 0\nD  {c:.6f} {c:.6f} {c:.6f}\nH  {c:.6f} {-c:.6f} {-c:.6f}\n'
                 f'H  {-c:.6f} {c:.6f} {-c:.6f}\nH  {-c:.6f} {-c:.6f} {c:.6f}\n')


if __name__ == '__main__':
    main()
