/**
 * Symmetry of vibrational levels beyond fundamentals and the selection rules for transitions between
 * them: overtones (symmetric powers of a degenerate mode's irrep, not plain direct powers), combination
 * levels (direct products over modes) and hot bands Γ(initial) ⊗ Γ(μ or α) ⊗ Γ(final) ∋ totally symmetric.
 */
import type { CartesianComponent, PointGroup } from './group-types.js';
import {
  directProduct,
  irrepByLabel,
  reduceCharacters,
  symmetricPower,
  type Representation,
} from './representation.js';

/** v quanta in one normal mode of the given species; each entry of a level is a different mode. */
export interface Excitation {
  readonly irrep: string;
  readonly quanta: number;
}

/** Selection rules between one symmetry component of each level (e.g. the Σg+ part of 2ν2). */
export interface ComponentTransition {
  readonly initial: string;
  readonly final: string;
  readonly ir: boolean;
  readonly irComponents: readonly CartesianComponent[];
  readonly raman: boolean;
  readonly ramanComponents: readonly string[];
}

/** Selection rules for one transition between two vibrational levels. */
export interface TransitionActivity {
  readonly initial: Representation;
  readonly final: Representation;
  /** Γ(initial) ⊗ Γ(final): the transition is allowed for each dipole or polarisability component it contains. */
  readonly product: Representation;
  readonly ir: boolean;
  readonly irComponents: readonly CartesianComponent[];
  readonly raman: boolean;
  readonly ramanComponents: readonly string[];
  /** The same rules for each pair of symmetry components of the two levels. */
  readonly components: readonly ComponentTransition[];
}

/** Symmetry of the level with these excitations (the ground state for an empty list). */
export function levelSymmetry(group: PointGroup, excitations: readonly Excitation[]): Representation {
  guardLambda(group, excitations);
  const factors = excitations.map((e) => symmetricPower(group, irrepByLabel(group, e.irrep).characters, e.quanta));
  const characters = factors.length ? directProduct(...factors) : group.classes.map(() => 1);
  return { characters, decomposition: reduceCharacters(group, characters) };
}

/** IR and Raman selection rules for initial → final (a fundamental, overtone, combination or hot band). */
export function transitionActivity(
  group: PointGroup,
  initial: readonly Excitation[],
  final: readonly Excitation[],
): TransitionActivity {
  // The product reaches |Λi| + |Λf|, so the model limit applies to both levels together.
  guardLambda(group, [...initial, ...final]);
  const gi = levelSymmetry(group, initial);
  const gf = levelSymmetry(group, final);
  const overall = allowed(group, gi.characters, gf.characters);
  const components = Object.keys(gi.decomposition).flatMap((li) =>
    Object.keys(gf.decomposition).map((lf) => {
      const { ir, irComponents, raman, ramanComponents } = allowed(group, irrepByLabel(group, li).characters, irrepByLabel(group, lf).characters);
      return { initial: li, final: lf, ir, irComponents, raman, ramanComponents };
    }),
  );
  return { initial: gi, final: gf, ...overall, components };
}

/** Γi ⊗ Γf and the dipole and polarisability components it contains (Γi ⊗ Γμ ⊗ Γf ∋ A1 for real irreps). */
function allowed(group: PointGroup, ci: readonly number[], cf: readonly number[]) {
  const characters = directProduct(ci, cf);
  const product = { characters, decomposition: reduceCharacters(group, characters) };
  const present = Object.keys(product.decomposition).map((l) => irrepByLabel(group, l));
  const irComponents = (['x', 'y', 'z'] as const).filter((c) => present.some((ir) => ir.translations.includes(c)));
  const ramanComponents = [...new Set(present.flatMap((ir) => ir.quadratics))];
  return { product, ir: irComponents.length > 0, irComponents, raman: ramanComponents.length > 0, ramanComponents };
}

/** Linear groups run on a finite model that cannot tell |Λ| beyond its limit: refuse such levels. */
function guardLambda(group: PointGroup, excitations: readonly Excitation[]): void {
  if (!group.linear) return;
  const reach = excitations.reduce((s, e) => s + e.quanta * (irrepByLabel(group, e.irrep).lambda ?? 0), 0);
  if (reach > group.linear.maxLambda) {
    throw new RangeError(
      `${group.name}: this level can reach |Λ| = ${reach}, beyond the |Λ| ≤ ${group.linear.maxLambda} that the model group ${group.linear.modelGroup} resolves`,
    );
  }
}
