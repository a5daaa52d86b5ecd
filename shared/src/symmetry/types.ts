/**
 * Types shared by the symmetry engine's parts: structures, operations, the point-group catalogue
 * and the results. Coordinates are in ångström.
 *
 * Standard orientation (the contract between detection and the catalogue): the catalogue's
 * operation matrices are written for a molecule placed as follows, and detection rotates every
 * molecule into this frame.
 * - Centre of mass at the origin; the principal (highest-order) axis along z.
 * - Cs: the mirror is the xy plane. Ci: inversion only.
 * - Cnv: one σv contains the x axis (the xz plane). A planar C2v molecule lies in the yz plane
 *   under the `yz` convention (Mulliken 1955, the default) and in the xz plane under `xz`.
 * - Cnh: σh is the xy plane. Dn, Dnh: one C2′ along x (Dnh: one σv is the xz plane).
 * - D2h planar: the molecule lies in the yz plane (`yz`) or the xz plane (`xz`).
 * - Dnd: one C2′ along x; the σd bisect neighbouring C2′ axes.
 * - T, Td, Th, O, Oh: the three C2 (or S4, C4) axes along x, y and z; C3 along (±1, ±1, ±1).
 * - I, Ih: three perpendicular C2 axes along x, y and z; C5 axes along (0, ±1, ±φ) and their
 *   cyclic permutations, φ the golden ratio.
 * - Linear: the molecular axis is z.
 */

export type Vec3 = readonly [number, number, number];

/** Row-major 3×3 matrix acting on column vectors: v′ = M v. */
export type Mat3 = readonly [number, number, number, number, number, number, number, number, number];

/** One atom: element symbol as written in the periodic table, optional mass number. */
export interface Atom {
  readonly element: string;
  /** Mass number when the file names an isotope (D → H with isotope 2); undefined for natural abundance. */
  readonly isotope?: number;
  readonly position: Vec3;
}

/** A molecule as read from a structure file. */
export interface Structure {
  readonly title?: string;
  readonly atoms: readonly Atom[];
  /** Bonds as pairs of atom indices when the file lists them (MOL V2000); otherwise derived from distances. */
  readonly bonds?: readonly (readonly [number, number])[];
}

/** Which plane a planar C2v or D2h molecule occupies in the standard orientation. */
export type PlanarConvention = 'yz' | 'xz';
