import { describe, expect, it } from 'vitest';
import { detectPointGroup } from './index.js';
import { parseXyz } from '../../structure/index.js';
import { pointGroup } from '../catalogue.js';
import { apply, det, mul, transpose } from '../mat3.js';
import type { Mat3, Structure } from '../types.js';
import { displaced, fixtureMolecules, seededRandom } from './__tests__/helpers.js';

const molecules = fixtureMolecules();

describe('detectPointGroup on the fixture molecules', () => {
  it('covers the groups the G2 set lacks', () => {
    const groups = new Set(molecules.map((m) => m.group));
    for (const g of ['Oh', 'Ih', 'I', 'O', 'T', 'Th', 'S4', 'S6', 'S8', 'C3h', 'D4d', 'D5h', 'D5d', 'D8h', 'C4v', 'C5v', 'C6v', 'C4h', 'C6h', 'D3', 'C3', 'Ci']) {
      expect(groups.has(g), g).toBe(true);
    }
  });

  for (const m of molecules) {
    it(`${m.name} is ${m.group} (the group it was built in)`, () => {
      const d = detectPointGroup(m.structure);
      expect(d.pointGroup).toBe(m.group);
      expect(d.maxDeviation).toBeLessThan(1e-4);
    });
  }
});

describe('noisy copies', () => {
  // 0.02 Å in a random direction for every atom must still give the ideal group at the default 0.1 Å.
  for (const m of molecules) {
    it(`${m.name} with 0.02 Å noise stays ${m.group}`, () => {
      const random = seededRandom(m.name.length * 7919 + 17);
      for (let k = 0; k < 4; k++) expect(detectPointGroup(displaced(m.structure, 0.02, random)).pointGroup).toBe(m.group);
    });
  }

  it('symmetrise makes a noisy copy exactly symmetric in the standard orientation', () => {
    const sf6 = molecules.find((m) => m.name === 'sf6')!.structure;
    const d = detectPointGroup(displaced(sf6, 0.02, seededRandom(5)), { symmetrise: true });
    expect(d.symmetrised).toBe(true);
    expect(d.maxDeviation).toBeGreaterThan(0.005);
    const again = detectPointGroup({ atoms: d.oriented }, { tolerance: 0.001 });
    expect(again.pointGroup).toBe('Oh');
  });

  it('a tighter tolerance than the noise lowers the group', () => {
    const ch4 = molecules.find((m) => m.name === 'ccl4')!.structure;
    expect(detectPointGroup(displaced(ch4, 0.05, seededRandom(3)), { tolerance: 0.01 }).pointGroup).not.toBe('Td');
  });
});

describe('isotopologues', () => {
  it('CH3D is C3v with the centre of mass moved toward D', () => {
    const d = detectPointGroup(molecules.find((m) => m.name === 'ch3d')!.structure);
    expect(d.pointGroup).toBe('C3v');
    expect(d.topType).toBe('symmetric-prolate');
    // C sits at the origin of the file; with D (2.014 u) the centre moves 0.0443 Å along C–D (computed from the masses).
    const c = Math.hypot(...d.centre);
    expect(c).toBeCloseTo((1.087 * (2.0141 - 1.0078)) / (12.011 + 2.0141 + 3 * 1.008), 3);
  });

  it('the same geometry with four H is Td', () => {
    const ch3d = molecules.find((m) => m.name === 'ch3d')!.structure;
    const ch4: Structure = { atoms: ch3d.atoms.map((a) => ({ element: a.element, position: a.position })) };
    expect(detectPointGroup(ch4).pointGroup).toBe('Td');
  });
});

const water = parseXyz('3\nwater\nO 0 0 0.1173\nH 0 0.7572 -0.4692\nH 0 -0.7572 -0.4692\n');

describe('standard orientation', () => {
  it('puts planar H2O in the yz plane by default and in xz with convention xz', () => {
    const yz = detectPointGroup(water);
    expect(yz.pointGroup).toBe('C2v');
    for (const a of yz.oriented) expect(Math.abs(a.position[0])).toBeLessThan(1e-9);
    const xz = detectPointGroup(water, { convention: 'xz' });
    for (const a of xz.oriented) expect(Math.abs(a.position[1])).toBeLessThan(1e-9);
    expect(xz.convention).toBe('xz');
  });

  it('gives a proper rotation with oriented = R (p − centre)', () => {
    const turned: Structure = {
      atoms: water.atoms.map((a) => ({ ...a, position: [a.position[1] + 3, -a.position[2], a.position[0] - 1] })),
    };
    const d = detectPointGroup(turned);
    expect(det(d.rotation)).toBeCloseTo(1, 9);
    const rrt = mul(d.rotation, transpose(d.rotation));
    rrt.forEach((v, i) => expect(v).toBeCloseTo(i % 4 === 0 ? 1 : 0, 9));
    turned.atoms.forEach((a, i) => {
      const p = apply(d.rotation, [a.position[0] - d.centre[0], a.position[1] - d.centre[1], a.position[2] - d.centre[2]]);
      p.forEach((v, k) => expect(v).toBeCloseTo(d.oriented[i].position[k], 9));
    });
  });

  it('places every fixture so that the catalogue operations map it onto itself', () => {
    for (const m of molecules) {
      const d = detectPointGroup(m.structure);
      let group;
      try {
        group = pointGroup(d.pointGroup);
      } catch {
        continue; // groups outside the catalogue are checked by detection's own verification
      }
      expect(d.operations.length, m.name).toBe(group.order);
    }
  });

  it('puts the C2′ of XeF4 through the F atoms (x axis) and benzene-like C6v σv through atoms', () => {
    const xef4 = detectPointGroup(molecules.find((m) => m.name === 'xef4')!.structure);
    expect(xef4.oriented.filter((a) => a.element === 'F').some((a) => Math.abs(a.position[1]) < 1e-6 && Math.abs(a.position[0]) > 1)).toBe(true);
    const c6v = detectPointGroup(molecules.find((m) => m.name === 'benzene-argon')!.structure);
    expect(c6v.oriented.filter((a) => a.element === 'C').some((a) => Math.abs(a.position[1]) < 1e-6)).toBe(true);
  });

  it('puts the C2 axes of Td along x, y, z and the C5 of Ih along (0, 1, φ)', () => {
    const ccl4 = detectPointGroup(molecules.find((m) => m.name === 'ccl4')!.structure);
    for (const a of ccl4.oriented.filter((x) => x.element === 'Cl')) {
      expect(Math.abs(Math.abs(a.position[0]) - Math.abs(a.position[1]))).toBeLessThan(1e-6);
    }
    const b12 = detectPointGroup(molecules.find((m) => m.name === 'b12h12')!.structure);
    const phi = (1 + Math.sqrt(5)) / 2;
    const boron = b12.oriented.filter((a) => a.element === 'B').map((a) => a.position);
    const r = Math.hypot(...boron[0]);
    const target = [0, r / Math.hypot(1, phi), (r * phi) / Math.hypot(1, phi)];
    expect(boron.some((p) => Math.hypot(p[0] - target[0], p[1] - target[1], p[2] - target[2]) < 1e-6)).toBe(true);
  });
});

describe('result contents', () => {
  it('lists the elements of NH3 and hands out its operations', () => {
    const nh3 = parseXyz('4\nNH3\nN 0 0 0.1173\nH 0 0.9377 -0.2737\nH 0.8121 -0.4689 -0.2737\nH -0.8121 -0.4689 -0.2737\n');
    const d = detectPointGroup(nh3);
    expect(d.pointGroup).toBe('C3v');
    expect(d.order).toBe(6);
    expect(d.operations).toHaveLength(6);
    const labels = d.elements.map((e) => e.label).sort();
    expect(labels).toEqual(['C3', 'E', 'σv', 'σv', 'σv']);
    const c3 = d.elements.find((e) => e.kind === 'Cn')!;
    expect(c3.order).toBe(3);
    expect(Math.abs(c3.axis![2])).toBeCloseTo(1, 9);
    for (const op of d.operations) expect(Math.abs(det(op as Mat3))).toBeCloseTo(1, 9);
  });

  it('labels the elements of BF3 from the catalogue classes', () => {
    const r = 1.31; // B–F from memory
    const bf3 = detectPointGroup({
      atoms: [{ element: 'B', position: [0, 0, 0] }, ...[0, 1, 2].map((k) => ({ element: 'F', position: [r * Math.cos((2 * Math.PI * k) / 3 + 0.4), r * Math.sin((2 * Math.PI * k) / 3 + 0.4), 0] as const }))],
    });
    expect(bf3.pointGroup).toBe('D3h');
    const count = (label: string) => bf3.elements.filter((e) => e.label === label).length;
    expect([count('C3'), count('C2'), count('σh'), count('σv'), count('S3')]).toEqual([1, 3, 1, 3, 1]);
  });

  it('detects axial groups outside the catalogue with their generated operations', () => {
    // Tropylium-like C7H7 ring (C–C 1.40, C–H 1.08 Å, from memory): D7h, not in the character tables.
    const rc = 1.4 / (2 * Math.sin(Math.PI / 7));
    const ring = (element: string, rad: number) => Array.from({ length: 7 }, (_, k) => ({ element, position: [rad * Math.cos((2 * Math.PI * k) / 7), rad * Math.sin((2 * Math.PI * k) / 7), 0] as const }));
    const d = detectPointGroup({ atoms: [...ring('C', rc), ...ring('H', rc + 1.08)] });
    expect(d.pointGroup).toBe('D7h');
    expect(d.order).toBe(28);
    expect(d.elements.find((e) => e.kind === 'Cn' && e.order === 7)?.label).toBe('C7');
    expect(d.elements.filter((e) => e.kind === 'σ' && e.label === 'σv')).toHaveLength(7);
  });

  it('reports linear molecules with an infinite order', () => {
    const co2 = detectPointGroup(parseXyz('3\nCO2\nC 0 0 0\nO 1.16 0 0\nO -1.16 0 0\n'));
    expect(co2.pointGroup).toBe('D∞h');
    expect(co2.order).toBe(Infinity);
    expect(co2.topType).toBe('linear');
    for (const a of co2.oriented) expect(Math.hypot(a.position[0], a.position[1])).toBeLessThan(1e-9);
    expect(detectPointGroup(parseXyz('3\nHCN\nH 0 0 -1.066\nC 0 0 0\nN 0 0 1.153\n')).pointGroup).toBe('C∞v');
  });

  it('tells spherical, symmetric and asymmetric tops apart', () => {
    const top = (name: string) => detectPointGroup(molecules.find((m) => m.name === name)!.structure).topType;
    expect(top('sf6')).toBe('spherical');
    expect(top('xef4')).toBe('symmetric-oblate');
    expect(top('allene')).toBe('symmetric-prolate');
    expect(top('dichloroethene-trans')).toBe('asymmetric');
    expect(detectPointGroup(water).topType).toBe('asymmetric');
  });
});

describe('bad input', () => {
  it('refuses a tolerance outside (0, 1] Å and an unknown convention', () => {
    expect(() => detectPointGroup(water, { tolerance: 0 })).toThrow(/tolerance/);
    expect(() => detectPointGroup(water, { tolerance: Number.NaN })).toThrow(/tolerance/);
    expect(() => detectPointGroup(water, { tolerance: 2 })).toThrow(/tolerance/);
    expect(() => detectPointGroup(water, { convention: 'xy' as never })).toThrow(/convention/);
  });

  it('refuses empty structures, single atoms and unknown elements', () => {
    expect(() => detectPointGroup({ atoms: [] })).toThrow(/no atoms/);
    expect(() => detectPointGroup({ atoms: [{ element: 'Ar', position: [0, 0, 0] }] })).toThrow(/single atom/);
    expect(() => detectPointGroup({ atoms: [{ element: 'Qq', position: [0, 0, 0] }, { element: 'H', position: [1, 0, 0] }] })).toThrow(/no mass/);
  });
});

describe('large structures', () => {
  it('finds Oh for a 10 × 10 × 10 cubic cluster of 1,000 atoms', () => {
    const atoms = [];
    for (let i = 0; i < 10; i++) for (let j = 0; j < 10; j++) for (let k = 0; k < 10; k++) atoms.push({ element: 'C', position: [1.5 * i, 1.5 * j, 1.5 * k] as const });
    const d = detectPointGroup({ atoms });
    expect(d.pointGroup).toBe('Oh');
    expect(d.oriented).toHaveLength(1000);
  });

  it('finds C1 for 1,000 atoms at random positions', () => {
    const random = seededRandom(99);
    const atoms = Array.from({ length: 1000 }, () => ({ element: 'C', position: [30 * random(), 30 * random(), 30 * random()] as const }));
    expect(detectPointGroup({ atoms }).pointGroup).toBe('C1');
  });
});
