// The command-line contracts of the README ("Command line"), run as a user would run them.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../../', import.meta.url));
const cli = (...args) => spawnSync('node', [join(root, 'scripts/cli.mjs'), ...args], { encoding: 'utf8' });
const json = (...args) => {
  const r = cli(...args, '--json');
  assert.equal(r.status, 0, r.stderr);
  const lines = r.stdout.trim().split('\n');
  assert.equal(lines.length, 1, 'exactly one JSON object on stdout');
  return JSON.parse(lines[0]);
};
const dir = mkdtempSync(join(tmpdir(), 'siteband-cli-'));
const file = (name, text) => {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
};

// BF3: B–F 1.313 Å (from memory of the NIST CCCBDB experimental geometry), planar, D3h.
const bf3 = file('bf3.xyz', '4\nboron trifluoride\nB 0 0 0\nF 1.313 0 0\nF -0.6565 1.13709 0\nF -0.6565 -1.13709 0\n');

test('symmetry --json gives the documented object for BF3 (Γvib A1′ + A2″ + 2E′: REFERENCES §3, Cotton from memory)', () => {
  const r = json('symmetry', bf3);
  assert.equal(r.pointGroup, 'D3h');
  assert.equal(r.atoms, 4);
  assert.deepEqual(r.vibrations.gamma, { "A1'": 1, "E'": 2, "A2''": 1 });
  assert.equal(r.vibrations.total, 6);
  assert.equal(r.vibrations.irActive, 3);
  assert.equal(r.vibrations.ramanActive, 3);
  assert.equal(r.vibrations.silent, 0);
  const a2 = r.vibrations.modes.find((m) => m.label === "A2''");
  assert.deepEqual([a2.count, a2.degeneracy, a2.ir, a2.raman], [1, 1, true, false]);
});

test('symmetry --convention chooses the plane of a planar C2v molecule (H2O: B2 in yz, B1 in xz; Mulliken 1955)', () => {
  const water = file('water.xyz', '3\nwater\nO 0 0 0.1173\nH 0 0.7572 -0.4692\nH 0 -0.7572 -0.4692\n');
  assert.deepEqual(json('symmetry', water).vibrations.gamma, { A1: 2, B2: 1 });
  assert.deepEqual(json('symmetry', water, '--convention', 'xz').vibrations.gamma, { A1: 2, B1: 1 });
});

test('symmetry without --json prints a readable table', () => {
  const r = cli('symmetry', bf3);
  assert.equal(r.status, 0, r.stderr);
  assert.match(r.stdout, /point group D3h/);
  assert.match(r.stdout, /Γvib = A1′ \+ 2E′ \+ A2″|Γvib = A1′ \+ A2″ \+ 2E′/);
});

test('a malformed structure names the line and exits non-zero with nothing on stdout', () => {
  const r = cli('symmetry', file('bad.xyz', '2\nbad\nC 0 0 0\nO 0 0 1.2e\n'), '--json');
  assert.equal(r.status, 1);
  assert.equal(r.stdout, '');
  assert.match(r.stderr, /line 4/);
});

test('usage mistakes exit 2 with the usage text', () => {
  for (const args of [['symmetry'], ['frobnicate', bf3], ['symmetry', bf3, '--convention', 'zz'], ['identify', bf3]]) {
    const r = cli(...args);
    assert.equal(r.status, 2, args.join(' '));
    assert.match(r.stderr, /usage:/);
  }
});

test('identify --json gives peaks and ranked candidates with the documented fields', () => {
  // An invented ATR-free absorbance scan of an ethanol-like liquid, built from the library's bands.
  const rows = ['Wavenumber (cm-1),Absorbance'];
  const bands = [[880, 0.3], [1050, 1], [1088, 0.6], [1380, 0.2], [1450, 0.25], [2928, 0.5], [2973, 0.7], [3330, 0.8]];
  for (let x = 4000; x >= 600; x -= 2) {
    const y = bands.reduce((s, [c, h]) => s + h * Math.exp(-(((x - c) / 9) ** 2)), 0.02);
    rows.push(`${x},${y.toFixed(5)}`);
  }
  const r = json('identify', file('scan.csv', rows.join('\n')), '--technique', 'ir', '--phase', 'condensed');
  assert.equal(r.technique, 'ir');
  assert.ok(r.peaks.length >= 6);
  for (const p of r.peaks) assert.ok(Number.isFinite(p.x) && Number.isFinite(p.height));
  assert.ok(r.candidates.length > 0);
  for (const c of r.candidates) {
    for (const k of ['name', 'cas', 'score', 'explained', 'missing', 'against', 'hazards']) assert.ok(k in c, k);
    assert.ok(c.score >= 0 && c.score <= 1);
  }
  const scores = r.candidates.map((c) => c.score);
  assert.deepEqual(scores, [...scores].sort((a, b) => b - a), 'best first');
  assert.equal(r.candidates[0].cas, '64-17-5', 'ethanol ranks first');
  assert.ok('mixture' in r);
  assert.ok(r.cautions.some((c) => /presumptive/i.test(c)));
});

test('identify on a file that is not a spectrum explains why', () => {
  const r = cli('identify', bf3, '--technique', 'raman', '--json');
  assert.equal(r.status, 1);
  assert.equal(r.stdout, '');
  assert.match(r.stderr, /error: /);
});

test('the CLI builds shared on demand (a fresh clone has no dist)', () => {
  // Only checks that the build helper is wired: it must leave a dist the CLI can import.
  execFileSync('node', ['-e', "import('@siteband/shared').then(m => { if (!m.checkStructure) process.exit(1) })"], { cwd: root });
});
