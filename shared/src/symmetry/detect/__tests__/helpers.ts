/** Shared by the detection tests: fixture files and seeded noise. */
import { readdirSync, readFileSync } from 'node:fs';
import type { Structure } from '../../types.js';
import { parseXyz } from '../../../structure/index.js';

export const REPO = new URL('../../../../../', import.meta.url);
export const fixturePath = (relative: string): URL => new URL(relative, REPO);
export const readJson = <T>(relative: string): T => JSON.parse(readFileSync(fixturePath(relative), 'utf8')) as T;

/** The fixture molecules with the group written in their title line (`name; group=X; source`). */
export function fixtureMolecules(): { name: string; group: string; structure: Structure }[] {
  const dir = fixturePath('fixtures/molecules/');
  return readdirSync(dir)
    .filter((f) => f.endsWith('.xyz'))
    .map((f) => {
      const structure = parseXyz(readFileSync(new URL(f, dir), 'utf8'));
      const group = /group=([^;]+);/.exec(structure.title ?? '')?.[1];
      if (!group) throw new Error(`${f}: title has no group=`);
      return { name: f.replace(/\.xyz$/, ''), group, structure };
    });
}

/** Park–Miller generator: the same "random" noise on every run. */
export function seededRandom(seed: number): () => number {
  let s = seed;
  return () => {
    s = (s * 16807) % 2147483647;
    return s / 2147483647;
  };
}

/** Every atom moved by exactly `distance` Å in a random direction. */
export function displaced(structure: Structure, distance: number, random: () => number): Structure {
  return {
    atoms: structure.atoms.map((a) => {
      let d = [0, 0, 0];
      let n = 0;
      while (n < 1e-3) {
        d = [random() - 0.5, random() - 0.5, random() - 0.5];
        n = Math.hypot(d[0], d[1], d[2]);
      }
      return { ...a, position: [a.position[0] + (distance * d[0]) / n, a.position[1] + (distance * d[1]) / n, a.position[2] + (distance * d[2]) / n] };
    }),
  };
}

/** pymatgen's spelling of the linear groups in ours. */
export const fromPymatgen = (name: string): string => name.replace('*', '∞');
