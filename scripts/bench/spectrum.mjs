// Speed of the spectrum pipeline on a 4,096-point synthetic scan (invented bands, seeded noise):
// median times of import, preprocessing (baseline and smoothing inside processScan) and peak
// picking over repeated runs. Plain Node ESM against the built shared package:
//   npm run build -w shared && node scripts/bench/spectrum.mjs [runs]
import os from 'node:os';
import { pathToFileURL } from 'node:url';
import {
  estimateBaseline,
  importSpectrum,
  noiseSigma,
  pickPeaks,
  processScan,
  smoothSavitzkyGolay,
  smoothingNoiseGain,
  spectrumToCsv,
  spectrumToJcamp,
  DEFAULT_BASELINE,
} from '../../shared/dist/spectrum/index.js';
import { seededRandom } from '../sync-harness/random.mjs';

const POINTS = 4096;

/** Seeded uniform numbers (mulberry32), so every run times the same scan. */
function syntheticScan(technique) {
  const random = seededRandom(technique === 'ir' ? 1 : 2);
  const gauss = () => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
  const from = technique === 'ir' ? 400 : 150;
  const step = 3600 / (POINTS - 1);
  const bands = technique === 'ir'
    ? [[1028, 0.3, 10], [1100, 0.3, 12], [1601, 0.25, 8], [1715, 0.6, 18], [2850, 0.35, 16], [2950, 0.4, 20], [3060, 0.2, 12]]
    : [[621, 160, 7], [1001, 1000, 6], [1032, 270, 7], [1155, 130, 8], [1450, 80, 10], [1602, 280, 9], [2904, 130, 14], [3054, 320, 14]];
  const xCm1 = Float64Array.from({ length: POINTS }, (_, i) => from + i * step);
  const y = xCm1.map((x) => {
    let v = technique === 'ir' ? 0.05 + 2e-5 * x : 20000 * Math.exp(-(((x - 1500) / 1400) ** 2)) + 2 * x;
    for (const [c, h, w] of bands) v += h / (1 + ((x - c) / (w / 2)) ** 2);
    return v + (technique === 'ir' ? 0.002 : 5) * gauss();
  });
  return { xCm1, y, ordinate: technique === 'ir' ? 'absorbance' : 'intensity', technique, title: 'synthetic (invented) bench scan' };
}

function median(values) {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

function time(runs, task) {
  const times = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    task();
    times.push(performance.now() - start);
  }
  return median(times);
}

/** Time each stage on a 4,096-point IR and Raman scan; returns rows of { technique, stage, medianMs }. */
export function measureSpectrumBench(runs = 50) {
  const rows = [];
  for (const technique of ['ir', 'raman']) {
    const scan = syntheticScan(technique);
    const csv = spectrumToCsv(scan);
    const jcamp = spectrumToJcamp(scan);
    const step = scan.xCm1[1] - scan.xCm1[0];
    const baseline = estimateBaseline(scan.xCm1, scan.y, step, DEFAULT_BASELINE[technique]);
    const smooth = { windowSize: 9, polynomial: 3 };
    const smoothed = smoothSavitzkyGolay(baseline.corrected, smooth);
    const sigma = noiseSigma(baseline.corrected) * smoothingNoiseGain(smooth);
    // Warm the JIT once so the medians measure steady-state code.
    processScan(scan, { technique, phase: 'condensed' });
    rows.push(
      { technique, stage: 'import CSV', medianMs: time(runs, () => importSpectrum(csv)) },
      { technique, stage: 'import JCAMP-DX', medianMs: time(runs, () => importSpectrum(jcamp)) },
      { technique, stage: 'baseline', medianMs: time(runs, () => estimateBaseline(scan.xCm1, scan.y, step, DEFAULT_BASELINE[technique])) },
      { technique, stage: 'smoothing', medianMs: time(runs, () => smoothSavitzkyGolay(baseline.corrected, smooth)) },
      { technique, stage: 'peak picking', medianMs: time(runs, () => pickPeaks(scan.xCm1, smoothed, { noiseSigma: sigma })) },
      { technique, stage: 'processScan (all preprocessing + peaks)', medianMs: time(runs, () => processScan(scan, { technique, phase: 'condensed' })) },
    );
  }
  return rows;
}

/** Measure and print the stage table (what `npm run bench` shows). */
export function runSpectrumBench(runs = 50) {
  const rows = measureSpectrumBench(runs);
  console.log(`Spectrum pipeline, ${POINTS}-point synthetic scans, median of ${runs} runs (Node ${process.version}, load ${os.loadavg().map((l) => l.toFixed(2)).join(', ')})`);
  console.table(rows.map((r) => ({ technique: r.technique, stage: r.stage, 'median ms': Number(r.medianMs.toFixed(2)) })));
}

if (import.meta.url === pathToFileURL(process.argv[1]).href) runSpectrumBench(Number(process.argv[2] ?? 50));
