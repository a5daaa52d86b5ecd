// `identify FILE --technique ir|raman [--phase condensed|gas]`: likely compounds for one scan.
import { basename } from 'node:path';
import { DEFAULT_MAX_IMPORT_BYTES, identifySpectrum, importSpectrum } from '@siteband/shared';
import { UsageError } from './args.mjs';
import { readInput } from './read-file.mjs';
import { printIdentifyTable } from './identify-table.mjs';

/** Import, process and rank; prints JSON or a readable summary; returns the exit code. */
export function runIdentify({ file, options }) {
  if (!options.technique) throw new UsageError('--technique ir|raman is required');
  const phase = options.phase ?? 'condensed';
  const bytes = readInput(file, DEFAULT_MAX_IMPORT_BYTES);
  const spectrum = importSpectrum(bytes, {
    fileName: basename(file),
    technique: options.technique,
    ...(options.excitation ? { excitationNm: options.excitation } : {}),
  });
  const { processed, result } = identifySpectrum(spectrum, {
    process: { technique: options.technique, phase, ...(options.atr ? { atr: true } : {}) },
    ...(options.tolerance ? { toleranceCm1: options.tolerance } : {}),
  });
  const output = { file: basename(file), ...result, quality: processed.quality, processing: processed.parameters };
  if (options.json) console.log(JSON.stringify(output));
  else printIdentifyTable(output);
  return 0;
}
