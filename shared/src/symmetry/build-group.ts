/** Turns a GroupSpec into a PointGroup: closure, class check, characters and bases. */
import type { Complex, GroupOperation, Irrep, PointGroup } from './group-types.js';
import type { GroupSpec } from './group-spec.js';
import { closeGroup, conjugacyClasses } from './closure.js';
import { INVERSION, matKey, maxDiff } from './mat3.js';
import { describeOperation } from './operation-element.js';
import { quadraticBasis, rotationBasis, translationBasis } from './bases.js';
import { cleanNumber as clean } from './numeric.js';


const cleanComplex = (z: Complex): Complex => ({ re: clean(z.re), im: clean(z.im) });

/** Typographic primes for display: `A1''` → `A1″`, `E'` → `E′`. */
function displayLabel(label: string): string {
  return label.replace(/''/g, '″').replace(/'/g, '′');
}

/** Builds the group; throws when the spec's classes do not match the conjugacy classes of the closure. */
export function buildGroup(spec: GroupSpec): PointGroup {
  const elements = closeGroup(spec.classes.map((c) => c.representative));
  const computed = conjugacyClasses(elements);
  const elementIndex = new Map(elements.map((m, i) => [matKey(m), i]));
  const classOfElement = new Array<number>(elements.length).fill(-1);

  spec.classes.forEach((c, ci) => {
    const e = elementIndex.get(matKey(c.representative));
    const members = computed.find((cl) => e !== undefined && cl.includes(e));
    if (!members) throw new RangeError(`${spec.name}: class ${c.label} not found`);
    if (members.length !== c.size) {
      throw new RangeError(`${spec.name}: class ${c.label} has ${members.length} members, not ${c.size}`);
    }
    for (const m of members) {
      if (classOfElement[m] >= 0) throw new RangeError(`${spec.name}: class ${c.label} duplicates another class`);
      classOfElement[m] = ci;
    }
  });
  if (classOfElement.some((c) => c < 0)) throw new RangeError(`${spec.name}: the class list misses some operations`);

  const operations: GroupOperation[] = elements.map((matrix, i) => ({ matrix, classIndex: classOfElement[i] }));
  const irreps: Irrep[] = spec.irreps.map((ir) => {
    const characters = spec.classes.map((c, ci) => clean(ir.character(c.representative, ci)));
    const complex = ir.complex;
    const complexCharacters = complex
      ? ([0, 1] as const).map((k) => spec.classes.map((c, ci) => cleanComplex(complex(c.representative, ci)[k])))
      : undefined;
    const projection = {
      characterOfOp: operations.map((o) => characters[o.classIndex]),
      weight: complexCharacters ? 1 : characters[0],
    };
    return {
      label: ir.label,
      display: displayLabel(ir.label),
      dimension: characters[0],
      characters,
      ...(complexCharacters ? { complexCharacters: complexCharacters as unknown as [Complex[], Complex[]] } : {}),
      translations: translationBasis(elements, projection),
      rotations: rotationBasis(elements, projection),
      quadratics: quadraticBasis(elements, projection),
      ...(ir.lambda !== undefined ? { lambda: ir.lambda } : {}),
    };
  });

  return {
    name: spec.name,
    order: elements.length,
    classes: spec.classes.map((c) => ({
      label: c.label,
      size: c.size,
      element: describeOperation(c.representative),
      representative: c.representative,
    })),
    irreps,
    operations,
    hasInversion: elements.some((m) => maxDiff(m, INVERSION) < 1e-9),
    reference: spec.reference,
    ...(spec.linear ? { linear: spec.linear } : {}),
  };
}
