import { printable } from './pdf-renderer';

describe('printable', () => {
  it('spells what the Latin subset of the font lacks and keeps the rest', () => {
    expect(printable('NO₃⁻ symmetric stretch (ν1, A1′), 1043 cm⁻¹')).toBe("NO3- symmetric stretch (nu1, A1'), 1043 cm-¹");
    expect(printable('C≡N stretch; δ CH₃ → ≥ 0.5')).toBe('C#N stretch; delta CH3 -> >= 0.5');
    expect(printable('Élan — 25 °C ± 2, 5 µm, “quoted”')).toBe('Élan — 25 °C ± 2, 5 µm, “quoted”');
  });
});
