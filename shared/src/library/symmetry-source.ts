/**
 * The link between the compound library and the symmetry engine: which species of a molecule's
 * Γvib are IR and Raman active. The library never types activity by hand; it asks the engine,
 * once per geometry, and caches the answer.
 */

/** One vibrational species as the engine reports it. */
export interface SpeciesActivity {
  readonly label: string;
  readonly count: number;
  readonly ir: boolean;
  readonly raman: boolean;
}

/** The engine's answer for one structure. */
export interface MoleculeSymmetry {
  readonly pointGroup: string;
  readonly species: readonly SpeciesActivity[];
}

/**
 * A function from XYZ text to the molecule's point group and Γvib with activity; `convention`
 * is the plane of a planar C2v/D2h molecule (`yz`, Mulliken 1955, when not given).
 */
export type SymmetryAnalyser = (xyz: string, convention?: 'yz' | 'xz') => MoleculeSymmetry;

/** Wrap an analyser so each distinct geometry and convention is analysed once. */
export function cachedAnalyser(analyse: SymmetryAnalyser): SymmetryAnalyser {
  const cache = new Map<string, MoleculeSymmetry>();
  return (xyz, convention = 'yz') => {
    const key = `${convention}\n${xyz}`;
    let hit = cache.get(key);
    if (hit === undefined) {
      hit = analyse(xyz, convention);
      cache.set(key, hit);
    }
    return hit;
  };
}
