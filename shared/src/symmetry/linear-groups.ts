/**
 * C∞v and D∞h through finite model groups. Atoms of a linear molecule lie on z, so C13v (for C∞v) and
 * D13d = D13 × Ci (for D∞h) act on them like the infinite groups. An irrep with |Λ| = m of the infinite
 * group restricts to E_m of the model (Σ+ → A1, Σ− → A2), one-to-one for m ≤ 6 = (13 − 1)/2; beyond
 * that the model cannot tell Λ from 13 − Λ, so products are limited to |Λ| ≤ 6 (see `levels.ts`).
 * Labels as in Herzberg (1945) (from memory): Σ+, Σ-, Π, Δ, Φ, Γ, H, I with g/u before the sign
 * (`Σg+`, `Σu-`, `Πu`); ASCII `+`/`-` keep the labels typeable as JSON keys.
 */
import type { GroupSpec, IrrepSpec } from './group-spec.js';
import { axialIrreps } from './axial-irreps.js';
import { cnvClasses, cosetClasses, dnClasses } from './axial-classes.js';
import { buildGroup } from './build-group.js';
import { timesInversion } from './group-products.js';
import { INVERSION } from './mat3.js';

const MODEL_N = 13;
/** Largest |Λ| the model groups resolve. */
const MAX_LAMBDA = (MODEL_N - 1) / 2;
const LAMBDA_SYMBOLS = ['Σ', 'Π', 'Δ', 'Φ', 'Γ', 'H', 'I'];
const REFERENCE = 'Herzberg, Infrared and Raman Spectra of Polyatomic Molecules (1945), linear-molecule labels (from memory)';

/** The model's A1, A2, E1 … E6 relabelled Σ+, Σ-, Π … I with their Λ. */
function linearIrreps(): IrrepSpec[] {
  return axialIrreps(MODEL_N, true).map((ir) => {
    if (ir.label === 'A1') return { ...ir, label: 'Σ+', lambda: 0 };
    if (ir.label === 'A2') return { ...ir, label: 'Σ-', lambda: 0 };
    const m = Number(ir.label.slice(1));
    return { ...ir, label: LAMBDA_SYMBOLS[m], lambda: m };
  });
}

/** The recipe of C∞v or D∞h. */
export function linearSpec(name: 'C∞v' | 'D∞h'): GroupSpec {
  if (name === 'C∞v') {
    return {
      name,
      reference: REFERENCE,
      classes: cnvClasses(MODEL_N),
      irreps: linearIrreps(),
      linear: { modelGroup: `C${MODEL_N}v`, maxLambda: MAX_LAMBDA },
    };
  }
  const rotations = buildGroup({ name: `D${MODEL_N}`, reference: REFERENCE, classes: dnClasses(MODEL_N), irreps: linearIrreps() });
  const classes = cosetClasses(dnClasses(MODEL_N), INVERSION, ['σv']);
  const sigmaV = classes[classes.length - 1].representative;
  // In D∞h the Σ sign is the behaviour under σv = i·C2′, not under C2′: u irreps swap sign, so re-read it.
  const signed = timesInversion(rotations).map((ir) =>
    ir.lambda === 0 ? { ...ir, label: ir.label.slice(0, -1) + (ir.character(sigmaV, classes.length - 1) > 0 ? '+' : '-') } : ir,
  );
  // Usual order within g and within u: Σ+, Σ-, Π, Δ, …
  const rank = (ir: IrrepSpec) => (ir.label.includes('u') ? 100 : 0) + (ir.lambda ?? 0) * 2 + (ir.label.endsWith('-') ? 1 : 0);
  const irreps = [...signed].sort((a, b) => rank(a) - rank(b));
  return {
    name,
    reference: REFERENCE,
    classes,
    irreps,
    linear: { modelGroup: `D${MODEL_N}d`, maxLambda: MAX_LAMBDA },
  };
}
