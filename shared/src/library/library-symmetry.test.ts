/**
 * Library ↔ symmetry engine: for every compound with a geometry, the fundamentals per species
 * equal the engine's Γvib, and the IR/Raman activity the ranking uses is the engine's.
 */
import { describe, expect, it } from 'vitest';
import { compoundBands } from '../identify/expected-bands.js';
import { engineAnalyser } from './engine-analyser.js';
import { loadLibrary } from './load.js';

const library = loadLibrary();
const molecules = library.compounds.filter((c) => c.geometry !== undefined);

describe('library ↔ symmetry engine', () => {
  it('covers the small molecules', () => {
    expect(molecules.length).toBeGreaterThanOrEqual(30);
  });

  for (const c of molecules) {
    it(`${c.id}: fundamentals per species equal the engine's Γvib; intensities only where the engine allows`, () => {
      const symmetry = engineAnalyser(c.geometry!.xyz, c.geometry!.planarConvention);
      const engine = Object.fromEntries(symmetry.species.map((s) => [s.label, s.count]));
      const listed: Record<string, number> = {};
      for (const f of c.fundamentals!) listed[f.label] = (listed[f.label] ?? 0) + 1;
      expect(listed).toEqual(engine);
      for (const f of c.fundamentals!) {
        const s = symmetry.species.find((x) => x.label === f.label)!;
        if (f.ir !== undefined) expect({ mode: f.mode, ir: s.ir }).toEqual({ mode: f.mode, ir: true });
        if (f.raman !== undefined) expect({ mode: f.mode, raman: s.raman }).toEqual({ mode: f.mode, raman: true });
      }
      for (const b of c.bands ?? []) {
        if (b.label === undefined) continue;
        const s = symmetry.species.find((x) => x.label === b.label);
        expect(s, `${c.id} band ${b.cm1} label ${b.label}`).toBeDefined();
        expect(b.technique === 'ir' ? s!.ir : s!.raman).toBe(true);
      }
    });
  }

  it('derives the point groups of familiar molecules', () => {
    const group = (id: string) => engineAnalyser(library.compounds.find((c) => c.id === id)!.geometry!.xyz).pointGroup;
    // Point groups per Herzberg (1945) / Cotton, from memory, as in the project check values §3.
    expect([group('water'), group('ammonia'), group('methane'), group('sulfur-hexafluoride'), group('benzene'), group('carbon-dioxide'), group('ethylene')]).toEqual([
      'C2v', 'C3v', 'Td', 'Oh', 'D6h', 'D∞h', 'D2h',
    ]);
  });

  it('derives the group from the geometry, not from its orientation', () => {
    const nh3 = library.compounds.find((c) => c.id === 'ammonia')!.geometry!.xyz;
    const [count, title, ...atoms] = nh3.trim().split('\n');
    // Rotate by 40° about x and 25° about z: the same molecule in an arbitrary frame.
    const ax = (40 * Math.PI) / 180;
    const az = (25 * Math.PI) / 180;
    const turned = atoms.map((line) => {
      const [el, ...xyz] = line.split(' ');
      const [x, y, z] = xyz.map(Number) as [number, number, number];
      const y1 = y * Math.cos(ax) - z * Math.sin(ax);
      const z1 = y * Math.sin(ax) + z * Math.cos(ax);
      return `${el} ${(x * Math.cos(az) - y1 * Math.sin(az)).toFixed(6)} ${(x * Math.sin(az) + y1 * Math.cos(az)).toFixed(6)} ${z1.toFixed(6)}`;
    });
    expect(engineAnalyser([count, title, ...turned].join('\n') + '\n')).toEqual(engineAnalyser(nh3));
  });

  it('takes IR and Raman activity from the engine: CO2 shows ν2, ν3 in IR and none of them in Raman', () => {
    const co2 = library.compounds.find((c) => c.id === 'carbon-dioxide')!;
    const ir = compoundBands(co2, 'ir', 'gas', engineAnalyser, 0.25);
    const raman = compoundBands(co2, 'raman', 'gas', engineAnalyser, 0.25);
    // Shimanouchi (1972): ν2 667 (Πu), ν3 2349 (Σu+) IR-active; mutual exclusion in D∞h.
    expect(ir.expected.map((b) => [b.cm1, b.label])).toEqual([[667, 'Πu'], [2349, 'Σu+']]);
    expect(raman.forbidden.map((b) => b.cm1)).toEqual([667, 2349]);
    expect(raman.expected.map((b) => b.cm1)).toEqual([1285.41, 1388.18]);
  });

  it('never expects a silent fundamental: benzene’s A2g, B2g, B1u, B2u, E2u are absent from both techniques', () => {
    const benzene = library.compounds.find((c) => c.id === 'benzene')!;
    const labels = (['ir', 'raman'] as const).flatMap((t) => {
      const b = compoundBands(benzene, t, 'condensed', engineAnalyser, 0.25);
      return [...b.expected, ...b.forbidden].map((x) => x.label);
    });
    for (const silent of ['A2g', 'B2g', 'B1u', 'B2u', 'E2u']) expect(labels).not.toContain(silent);
  });
});
