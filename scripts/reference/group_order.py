"""Order of a point group from its Schoenflies name, as the reference scripts need it."""
import re

FIXED = {'C1': 1, 'Ci': 2, 'Cs': 2, 'T': 12, 'Td': 24, 'Th': 24, 'O': 24, 'Oh': 48, 'I': 60, 'Ih': 120}


def schoenflies_order(name):
    """Order of the named group; None for the linear groups (C*v, D*h in pymatgen's spelling)."""
    if '*' in name or '∞' in name:
        return None
    if name in FIXED:
        return FIXED[name]
    m = re.fullmatch(r'([CDS])(\d+)([vhd]?)', name)
    if not m:
        raise ValueError(f'unknown Schoenflies name {name!r}')
    kind, n, suffix = m.group(1), int(m.group(2)), m.group(3)
    if kind == 'S':
        return n
    if kind == 'C':
        return n if suffix == '' else 2 * n
    return 2 * n if suffix == '' else 4 * n
