/**
 * The point-group catalogue. Labels and class order follow Cotton, *Chemical Applications of Group
 * Theory*, 3rd ed., Appendix IIA (from memory), with the conventions of `types.ts`: C2v B1 ∋ x; D2h
 * B1u ∋ z, B2u ∋ y, B3u ∋ x; D4h/D6h C2′ along x with B1g ∋ x²−y²; D3h C2′ along x; D2d B2 ∋ z; Td S4
 * along x, y, z. Tables are generated (axial formulas, products with Ci or Cs, T/O/I rows) and checked
 * by the catalogue tests, not typed one by one.
 */
import type { PointGroup } from './group-types.js';
import type { ClassSpec, GroupSpec, IrrepSpec } from './group-spec.js';
import { buildGroup } from './build-group.js';
import { axialIrreps } from './axial-irreps.js';
import {
  cnvClasses,
  cosetClasses,
  cyclicClasses,
  dndEvenClasses,
  dnClasses,
  improperCyclicClasses,
} from './axial-classes.js';
import { timesInversion, timesMirror, viaProperImage } from './group-products.js';
import { I_CLASSES, I_IRREPS, O_CLASSES, O_IRREPS, T_CLASSES, T_IRREPS } from './polyhedral-tables.js';
import { improper, INVERSION, mul, reflection, rotation } from './mat3.js';
import { linearSpec } from './linear-groups.js';

const REFERENCE = 'Cotton, Chemical Applications of Group Theory, 3rd ed., Appendix IIA (from memory)';
const SIGMA_H = reflection([0, 0, 1]);
const spec = (name: string, classes: GroupSpec['classes'], irreps: readonly IrrepSpec[]): GroupSpec => ({
  name,
  reference: REFERENCE,
  classes,
  irreps,
});

/** D2 keeps its own labels: A, B1 (z), B2 (y), B3 (x). */
function d2Irreps(): IrrepSpec[] {
  const [a1, a2, cos, sin] = axialIrreps(2, true);
  return [
    { ...a1, label: 'A' },
    { ...a2, label: 'B1' },
    { ...sin, label: 'B2' },
    { ...cos, label: 'B3' },
  ];
}

/** Vertical-plane labels produced by i × C2′ and i × C2″ in Dnh, n even. */
function dnhPlaneLabels(n: number): string[] {
  // i·C2′(x) is the yz plane; it holds a C2′ axis when n/2 is even (σv), otherwise a C2″ axis (σd).
  return (n / 2) % 2 === 0 ? ['σv', 'σd'] : ['σd', 'σv'];
}

function dnhSpec(n: number): GroupSpec {
  const base = pointGroup(`D${n}`);
  if (n % 2 === 1) return spec(`D${n}h`, cosetClasses(dnClasses(n), SIGMA_H, ['σv']), timesMirror(base));
  const classes =
    n === 2
      ? withInversion(dnClasses(2), [['i', 0], ['σ(xy)', 1], ['σ(xz)', 2], ['σ(yz)', 3]])
      : cosetClasses(dnClasses(n), INVERSION, dnhPlaneLabels(n));
  return spec(`D${n}h`, classes, timesInversion(base));
}

/**
 * A rotation group's classes followed by the i-coset in the published order: each entry names the
 * coset class and the rotation class it is i times (i·C5² is S10, i·C5 is S10³, i·C3 is S6 …).
 */
function withInversion(base: readonly ClassSpec[], coset: readonly (readonly [string, number])[]): ClassSpec[] {
  return [
    ...base,
    ...coset.map(([label, from]) => ({ label, size: base[from].size, representative: mul(INVERSION, base[from].representative) })),
  ];
}

/** Td: E, 8C3, 3C2, 6S4 (about x, y, z), 6σd (planes through z and a face diagonal). */
function tdClasses(): ClassSpec[] {
  const [e, c3] = O_CLASSES;
  return [
    e,
    c3,
    { label: '3C2', size: 3, representative: rotation([0, 0, 1], Math.PI) },
    { label: '6S4', size: 6, representative: improper([0, 0, 1], Math.PI / 2) },
    { label: '6σd', size: 6, representative: reflection([1, -1, 0]) },
  ];
}

/** Name → recipe. Derived groups build their base group first (memoised). */
const RECIPES: Record<string, () => GroupSpec> = {
  C1: () => spec('C1', cyclicClasses(1), axialIrreps(1, false)),
  Ci: () => spec('Ci', cosetClasses(cyclicClasses(1), INVERSION), timesInversion(pointGroup('C1'))),
  Cs: () => spec('Cs', cosetClasses(cyclicClasses(1), SIGMA_H), timesMirror(pointGroup('C1'))),
  S4: () => spec('S4', improperCyclicClasses(4), axialIrreps(4, false)),
  S6: () => spec('S6', cosetClasses(cyclicClasses(3), INVERSION), timesInversion(pointGroup('C3'))),
  S8: () => spec('S8', improperCyclicClasses(8), axialIrreps(8, false)),
  T: () => spec('T', T_CLASSES, T_IRREPS),
  O: () => spec('O', O_CLASSES, O_IRREPS),
  I: () => spec('I', I_CLASSES, I_IRREPS),
  Td: () => spec('Td', tdClasses(), viaProperImage(pointGroup('O'))),
  Th: () => spec('Th', withInversion(T_CLASSES, [['i', 0], ['4S6', 1], ['4S6⁵', 2], ['3σh', 3]]), timesInversion(pointGroup('T'))),
  Oh: () =>
    spec(
      'Oh',
      withInversion(O_CLASSES, [['i', 0], ['6S4', 3], ['8S6', 1], ['3σh', 4], ['6σd', 2]]),
      timesInversion(pointGroup('O')),
    ),
  Ih: () =>
    spec(
      'Ih',
      withInversion(I_CLASSES, [['i', 0], ['12S10', 2], ['12S10³', 1], ['20S6', 3], ['15σ', 4]]),
      timesInversion(pointGroup('I')),
    ),
  'C∞v': () => linearSpec('C∞v'),
  'D∞h': () => linearSpec('D∞h'),
};

for (let n = 2; n <= 6; n++) {
  RECIPES[`C${n}`] = () => spec(`C${n}`, cyclicClasses(n), axialIrreps(n, false));
  RECIPES[`C${n}v`] = () => spec(`C${n}v`, cnvClasses(n), axialIrreps(n, true));
  RECIPES[`D${n}`] = () => spec(`D${n}`, dnClasses(n), n === 2 ? d2Irreps() : axialIrreps(n, true));
  RECIPES[`C${n}h`] = () =>
    n % 2 === 0
      ? spec(`C${n}h`, cosetClasses(cyclicClasses(n), INVERSION), timesInversion(pointGroup(`C${n}`)))
      : spec(`C${n}h`, cosetClasses(cyclicClasses(n), SIGMA_H), timesMirror(pointGroup(`C${n}`)));
  RECIPES[`D${n}h`] = () => dnhSpec(n);
  RECIPES[`D${n}d`] = () =>
    n % 2 === 0
      ? spec(`D${n}d`, dndEvenClasses(n), axialIrreps(2 * n, true))
      : spec(`D${n}d`, cosetClasses(dnClasses(n), INVERSION, [`σd`]), timesInversion(pointGroup(`D${n}`)));
}
RECIPES.D8 = () => spec('D8', dnClasses(8), axialIrreps(8, true));
// D8h is not in that appendix: its class order (rotations by increasing angle, the i-coset in the same order) is ours.
RECIPES.D8h = () => ({
  ...dnhSpec(8),
  reference: 'Labels as in Cotton for D4h/D6h (from memory); class order by rotation angle, i-coset in the same order (our choice)',
});

const built = new Map<string, PointGroup>();

/** Other spellings accepted by pointGroup(): ASCII forms of ∞ and S2/C1h synonyms. */
const ALIASES: Record<string, string> = {
  Cinfv: 'C∞v',
  'C*v': 'C∞v',
  Dinfh: 'D∞h',
  'D*h': 'D∞h',
  S2: 'Ci',
  C1h: 'Cs',
};

/** The catalogue group with this Schoenflies name (built on first use); throws RangeError for unknown names. */
export function pointGroup(name: string): PointGroup {
  const key = ALIASES[name] ?? name;
  const cached = built.get(key);
  if (cached) return cached;
  const recipe = RECIPES[key];
  if (!recipe) throw new RangeError(`unknown point group "${name}"; known: ${pointGroupNames().join(', ')}`);
  const group = buildGroup(recipe());
  built.set(key, group);
  return group;
}

/** Names of all catalogue groups. */
export function pointGroupNames(): string[] {
  return Object.keys(RECIPES);
}
