"""Exact point-group operations in the standard orientation, and atoms as orbits under them.

Used by make-molecules.py to build idealised fixture geometries: representative atoms are
repeated by every operation of the group, so the result has the group's symmetry exactly.
"""
import math

import numpy as np

PHI = (1 + 5 ** 0.5) / 2


def rz(n, k=1):
    a = 2 * math.pi * k / n
    return np.array([[math.cos(a), -math.sin(a), 0], [math.sin(a), math.cos(a), 0], [0, 0, 1]])


def axis_rotation(axis, angle):
    u = np.asarray(axis, float) / np.linalg.norm(axis)
    k = np.array([[0, -u[2], u[1]], [u[2], 0, -u[0]], [-u[1], u[0], 0]])
    return np.eye(3) + math.sin(angle) * k + (1 - math.cos(angle)) * k @ k


def vertical_mirror(theta):
    """Reflection through the vertical plane that contains z and makes angle theta with x."""
    c, s = math.cos(2 * theta), math.sin(2 * theta)
    return np.array([[c, s, 0], [s, -c, 0], [0, 0, 1]])


C2X = np.diag([1.0, -1.0, -1.0])
C2Z = np.diag([-1.0, -1.0, 1.0])
SIGMA_H = np.diag([1.0, 1.0, -1.0])
SIGMA_XZ = np.diag([1.0, -1.0, 1.0])
INV = -np.eye(3)
C3_111 = np.array([[0.0, 0, 1], [1, 0, 0], [0, 1, 0]])
SIGMA_D_XY = np.array([[0.0, 1, 0], [1, 0, 0], [0, 0, 1]])
C5_ICO = axis_rotation((0, 1, PHI), 2 * math.pi / 5)

GENERATORS = {
    'C1': [], 'Ci': [INV], 'Cs': [SIGMA_H],
    'T': [C2Z, C3_111], 'Td': [C2Z, C3_111, SIGMA_D_XY], 'Th': [C2Z, C3_111, INV],
    'O': [rz(4), C3_111], 'Oh': [rz(4), C3_111, INV],
    'I': [C5_ICO, C2Z, C3_111], 'Ih': [C5_ICO, C2Z, C3_111, INV],
}


def axial(name):
    """Generators of an axial group (Cn, Cnv, Cnh, S2n, Dn, Dnh, Dnd) in the standard frame."""
    kind = name[0]
    digits = ''.join(ch for ch in name if ch.isdigit())
    n = int(digits)
    suffix = name[1 + len(digits):]
    if kind == 'S':
        return [SIGMA_H @ rz(n)]
    gens = [rz(n)]
    if kind == 'D':
        gens.append(C2X)
    if suffix == 'v':
        gens.append(SIGMA_XZ)
    elif suffix == 'h':
        gens.append(SIGMA_H)
    elif suffix == 'd':
        gens.append(vertical_mirror(math.pi / (2 * n)))
    return gens


def closure(gens):
    ops = [np.eye(3)]
    frontier = [np.eye(3)]
    while frontier:
        nxt = []
        for a in frontier:
            for g in gens:
                m = g @ a
                if not any(np.allclose(m, o, atol=1e-9) for o in ops):
                    ops.append(m)
                    nxt.append(m)
        frontier = nxt
    return ops


def orbit_atoms(group, reps):
    ops = closure(GENERATORS[group] if group in GENERATORS else axial(group))
    atoms = []
    for element, pos in reps:
        seen = []
        for op in ops:
            p = op @ np.asarray(pos, float)
            if not any(np.linalg.norm(p - q) < 1e-6 for q in seen):
                seen.append(p)
        atoms.extend((element, p) for p in seen)
    return atoms


def cyl(r, theta_deg, z):
    t = math.radians(theta_deg)
    return (r * math.cos(t), r * math.sin(t), z)


def puckered_ring(n, bond, angle_deg):
    """Radius and half-height of an n-ring puckered up/down alternately with the given bond and ring angle."""
    best = None
    for i in range(1, 200000):
        r = bond * i / 200000.0
        chord = 2 * r * math.sin(math.pi / n)
        if chord >= bond:
            break
        h = math.sqrt(bond ** 2 - chord ** 2) / 2
        p0 = np.array(cyl(r, 0, h))
        p1 = np.array(cyl(r, 360 / n, -h))
        p2 = np.array(cyl(r, 720 / n, h))
        u, v = p0 - p1, p2 - p1
        ang = math.degrees(math.acos(u @ v / np.linalg.norm(u) / np.linalg.norm(v)))
        if best is None or abs(ang - angle_deg) < best[0]:
            best = (abs(ang - angle_deg), r, h)
    return best[1], best[2]


def ring_r(n, bond):
    return bond / (2 * math.sin(math.pi / n))
