#!/usr/bin/env node
// Speed of identification on a 4,096-point scan against the compound library expanded
// synthetically to 10,000 entries (invented copies with shifted bands). Imports shared/dist:
// run `npm run build -w shared` first. Prints median stage times and the ratio of the ranking
// stage to a plain pass over the library's band arrays measured in the same run.
import os from 'node:os';
import { fileURLToPath } from 'node:url';
import { engineAnalyser, loadLibrary } from '../../shared/dist/library/index.js';
import {
  buildLibraryIndex,
  compoundBands,
  findMixture,
  identifyScan,
  MIXTURE_MIN_CANDIDATE_SCORE,
  MIXTURE_POOL_SIZE,
  observedPeaks,
  rankLibrary,
  sumBandPositions,
} from '../../shared/dist/identify/index.js';
import { processScan } from '../../shared/dist/spectrum/index.js';
import { seededRandom } from '../sync-harness/random.mjs';

const POINTS = 4096;
const ENTRIES = 10_000;

/** The bundled library plus invented copies (bands shifted up to ±15 cm⁻¹) up to `entries`. */
function expandedLibrary(entries, random) {
  const base = loadLibrary();
  const compounds = [...base.compounds];
  for (let k = 0; compounds.length < entries; k++) {
    const c = base.compounds[k % base.compounds.length];
    const shift = () => (2 * random() - 1) * 15;
    const fundamentals = c.fundamentals?.map((f) => ({ ...f, cm1: Object.fromEntries(Object.entries(f.cm1).map(([p, v]) => [p, Math.min(4000, Math.max(50, v + shift()))])) }));
    const bands = c.bands?.map((b) => ({ ...b, cm1: Math.min(4000, Math.max(50, b.cm1 + shift())) }));
    compounds.push({ ...c, id: `${c.id}-synthetic-${k}`, ...(fundamentals ? { fundamentals } : {}), ...(bands ? { bands } : {}) });
  }
  return { ...base, compounds };
}

function scanOf(compound, technique, random) {
  const bands = compoundBands(compound, technique, 'condensed', engineAnalyser, 0.25);
  const xCm1 = Float64Array.from({ length: POINTS }, (_, i) => 100 + (i * 3900) / (POINTS - 1));
  const y = new Float64Array(POINTS);
  for (const b of bands.expected) {
    const centre = b.cm1 + (2 * random() - 1) * 3;
    for (let i = 0; i < POINTS; i++) {
      const d = (xCm1[i] - centre) / 5;
      y[i] += b.weight / (1 + d * d);
    }
  }
  for (let i = 0; i < POINTS; i++) y[i] += 0.05 + (0.1 * i) / POINTS + 0.004 * (random() - 0.5);
  return { xCm1, y, ordinate: technique === 'ir' ? 'absorbance' : 'intensity', technique };
}

function median(f, runs) {
  // Warm up so the JIT has compiled the hot loops before timing.
  for (let i = 0; i < 10; i++) f();
  const times = [];
  let out;
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    out = f();
    times.push(performance.now() - t);
  }
  times.sort((a, b) => a - b);
  return { ms: times[runs >> 1], out };
}

/** Measure one scenario; returns the median stage times in ms and the ranking / plain-pass ratio. */
export function measureIdentifyBench({ runs = 51, technique = 'raman', compoundId = 'toluene' } = {}) {
  const random = seededRandom(42);
  const library = expandedLibrary(ENTRIES, random);
  const t0 = performance.now();
  const index = buildLibraryIndex(library.compounds, technique, 'condensed', engineAnalyser);
  const indexMs = performance.now() - t0;
  const scan = scanOf(library.compounds.find((c) => c.id === compoundId), technique, random);
  const processed = median(() => processScan(scan, { technique, phase: 'condensed' }), runs);
  const obs = observedPeaks(processed.out.peaks);
  const ranking = median(() => rankLibrary(index, obs, 10), runs);
  const pool = ranking.out.filter((r) => r.score >= MIXTURE_MIN_CANDIDATE_SCORE).slice(0, MIXTURE_POOL_SIZE).map((r) => index.bands[r.index]);
  const mixture = median(() => findMixture(pool, obs, 10), runs);
  const plain = median(() => sumBandPositions(index), runs);
  const whole = median(() => identifyScan({ technique, phase: 'condensed', peaks: processed.out.peaks }, { library }), runs);
  return {
    technique,
    compound: compoundId,
    entries: library.compounds.length,
    bandPositions: index.sharp.positionCm1.length + index.broad.positionCm1.length,
    points: POINTS,
    peaks: processed.out.peaks.length,
    top: library.compounds[ranking.out[0].index].id,
    indexBuildMs: indexMs,
    preprocessingAndPeaksMs: processed.ms,
    rankingMs: ranking.ms,
    mixtureMs: mixture.ms,
    identifyScanMs: whole.ms,
    plainPassMs: plain.ms,
    rankingToPlainPass: ranking.ms / plain.ms,
    pipelinePlusRankingMs: processed.ms + ranking.ms,
  };
}

/** Measure and print both scenarios (what `npm run bench` shows). */
export function runIdentifyBench() {
  console.log(`Identification against the library expanded to ${ENTRIES} entries (Node ${process.version}, load ${os.loadavg().map((l) => l.toFixed(2)).join(', ')})`);
  for (const scenario of [{ technique: 'raman', compoundId: 'toluene' }, { technique: 'ir', compoundId: 'paracetamol' }]) {
    const r = measureIdentifyBench(scenario);
    for (const [k, v] of Object.entries(r)) console.log(`${k.padEnd(24)} ${typeof v === 'number' && !Number.isInteger(v) ? v.toFixed(3) : v}`);
    console.log('');
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) runIdentifyBench();
