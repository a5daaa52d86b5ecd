/**
 * A live cross-check: runs pymatgen (Debian's python3-pymatgen, through scripts/reference/pymatgen-stdin.py)
 * on a handful of fixture molecules and compares with our detection. Runs only where /usr/bin/python3
 * can import pymatgen; the recorded comparison in pymatgen-reference.test.ts runs everywhere.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { detectPointGroup } from './index.js';
import { fixtureMolecules, fixturePath, fromPymatgen } from './__tests__/helpers.js';

const PYTHON = '/usr/bin/python3';
const hasPymatgen = spawnSync(PYTHON, ['-c', 'import pymatgen.symmetry.analyzer'], { timeout: 20000 }).status === 0;
const NAMES = ['sf6', 'xef4', 'pcl5', 'boric-acid', 's8', 'ferrocene-staggered', 'cyclohexane-chair', 'brf5', 'synthetic-c4h', 'ethane-twisted'];

describe('pymatgen live', () => {
  it.runIf(hasPymatgen)('agrees with pymatgen run now on ten fixture molecules', () => {
    const chosen = fixtureMolecules().filter((m) => NAMES.includes(m.name));
    expect(chosen).toHaveLength(NAMES.length);
    const input = chosen.map((m) => ({ name: m.name, symbols: m.structure.atoms.map((a) => a.element), positions: m.structure.atoms.map((a) => a.position) }));
    const run = spawnSync(PYTHON, [fileURLToPath(fixturePath('scripts/reference/pymatgen-stdin.py'))], { input: JSON.stringify(input), encoding: 'utf8', timeout: 60000 });
    expect(run.status, run.stderr).toBe(0);
    const answers = JSON.parse(run.stdout) as { name: string; pointGroup: string }[];
    for (const m of chosen) {
      const theirs = answers.find((a) => a.name === m.name)!.pointGroup;
      expect(detectPointGroup(m.structure).pointGroup, m.name).toBe(fromPymatgen(theirs));
    }
  }, 30000);
});
