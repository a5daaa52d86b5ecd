// Speed of point-group detection and of detection plus full Γvib at 3, 12, 60, 200 and 1,000 atoms,
// side by side with pymatgen's PointGroupAnalyzer on the same geometries (Debian's python3-pymatgen,
// spawned once; its times are measured inside Python, so start-up is not counted), with the machine's
// load average, since a loaded machine slows both sides. Plain Node ESM against the built shared package:
//   npm run build -w shared && node scripts/bench/symmetry.mjs [runs]
// The 200- and 1,000-atom structures are synthetic point grids (D4h, Oh); the others are H2O and
// benzene from ASE's G2 set and C60 from fixtures/molecules.
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { availableParallelism, loadavg } from 'node:os';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { parseXyz } from '../../shared/dist/structure/index.js';
import { detectPointGroup } from '../../shared/dist/symmetry/detect/index.js';
import { analyseVibrations } from '../../shared/dist/symmetry/index.js';

const REPO = new URL('../../', import.meta.url);
const PYTHON = '/usr/bin/python3';

function grid(nx, ny, nz, spacing = 1.5) {
  const atoms = [];
  for (let i = 0; i < nx; i++) for (let j = 0; j < ny; j++) for (let k = 0; k < nz; k++) {
    atoms.push({ element: 'C', position: [spacing * i, spacing * j, spacing * k] });
  }
  return { atoms };
}

function benchMolecules() {
  const g2 = JSON.parse(readFileSync(new URL('fixtures/reference/pymatgen-pointgroups.json', REPO), 'utf8')).molecules;
  const fromG2 = (name) => parseXyz(g2.find((m) => m.name === name).xyz);
  return [
    ['H2O (G2)', fromG2('H2O')],
    ['benzene (G2)', fromG2('C6H6')],
    ['C60', parseXyz(readFileSync(new URL('fixtures/molecules/c60.xyz', REPO), 'utf8'))],
    ['grid 5×5×8', grid(5, 5, 8)],
    ['grid 10×10×10', grid(10, 10, 10)],
  ];
}

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/**
 * Median of `runs` timed batches (ms per call). Each batch repeats fn until it has taken 50 ms, so
 * sub-millisecond calls are not lost in timer noise; 1 s of warm-up calls first (the catalogue's first
 * build of the group, and V8 optimising the hot loops: on a loaded machine that takes over a second
 * for a 3-atom structure, while pymatgen's interpreted code has no such start).
 */
function time(fn, runs) {
  const warm = performance.now();
  do fn();
  while (performance.now() - warm < 1000);
  const perCall = [];
  for (let r = 0; r < runs; r++) {
    let calls = 0;
    const t0 = performance.now();
    do {
      fn();
      calls++;
    } while (performance.now() - t0 < 50);
    perCall.push((performance.now() - t0) / calls);
  }
  return median(perCall);
}

function pymatgenTimes(molecules) {
  const input = molecules.map(([name, s]) => ({
    name,
    symbols: s.atoms.map((a) => a.element),
    positions: s.atoms.map((a) => a.position),
    repeats: s.atoms.length >= 1000 ? 1 : 5,
  }));
  const script = fileURLToPath(new URL('scripts/reference/pymatgen-stdin.py', REPO));
  const run = spawnSync(PYTHON, [script], { input: JSON.stringify(input), encoding: 'utf8', timeout: 600_000 });
  if (run.status !== 0) return { error: (run.error?.message ?? run.stderr).trim().split('\n').pop() };
  return { answers: new Map(JSON.parse(run.stdout).map((a) => [a.name, a])) };
}

const load = () => loadavg().map((x) => x.toFixed(2)).join(', ');

/** Prints the table of detection and Γvib times against pymatgen, with the load average before and after. */
export function runSymmetryBench(runs = 5) {
  const loadBefore = load();
  const molecules = benchMolecules();
  const py = pymatgenTimes(molecules);
  if (py.error) console.log(`pymatgen not available (${py.error}); showing our times only`);
  const rows = molecules.map(([name, structure]) => {
    let detection;
    const detectMs = time(() => (detection = detectPointGroup(structure, { symmetrise: true })), runs);
    // Γvib, activity and band types without internal coordinates: pymatgen finds no bonds either.
    const gammaMs = time(() => analyseVibrations(detection.pointGroup, detection.oriented, { covalentRadius: null }), runs);
    // The structure check's own composition also derives bonds and their symmetry-adapted combinations.
    const stretchMs = time(() => analyseVibrations(detection.pointGroup, detection.oriented), runs);
    const theirs = py.answers?.get(name);
    const pyMs = theirs ? theirs.seconds * 1000 : undefined;
    const theirGroup = theirs ? theirs.pointGroup.replace('*', '∞') : '–';
    return {
      structure: name,
      atoms: structure.atoms.length,
      ours: `${detection.pointGroup} (${Number.isFinite(detection.order) ? detection.order : '∞'} ops)`,
      pymatgen: theirs ? `${theirGroup} (${theirs.operations} ops)` : '–',
      'same group': theirs ? (theirGroup === detection.pointGroup ? 'yes' : 'NO') : '–',
      'detection ms': detectMs.toFixed(2),
      'detection + Γvib ms': (detectMs + gammaMs).toFixed(2),
      'with bond stretches ms': (detectMs + stretchMs).toFixed(1),
      'pymatgen ms': pyMs === undefined ? '–' : pyMs.toFixed(1),
      'pymatgen / ours (detection + Γvib)': pyMs === undefined ? '–' : `${(pyMs / (detectMs + gammaMs)).toFixed(1)}×`,
    };
  });
  console.log(`Point-group detection with symmetrisation, then Γvib by analyseVibrations (median of ${runs} batches after warm-up). pymatgen: median of 5 runs, 1 at 1,000 atoms.`);
  console.log(`Load average (1, 5, 15 min) on ${availableParallelism()} cores: ${loadBefore} before, ${load()} after.`);
  console.table(rows);
  return rows;
}

if (import.meta.url === pathToFileURL(process.argv[1]).href) runSymmetryBench(Number(process.argv[2] ?? 5));
