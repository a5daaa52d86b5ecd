/** The state of one scan on screen: the file, the settings it was run with, and the worker's answer. */
import { useCallback, useEffect, useRef, useState } from 'react';
import type { Library } from '@siteband/shared';
import type { IdentifyOutcome, ScanFile } from './protocol';
import type { IdentifyClient } from './identifyClient';
import { DEFAULT_PROCESSING, type ProcessingSettings, type ScanSettings } from './scanSettings';

export type ScanState =
  | { readonly status: 'empty' }
  | { readonly status: 'running'; readonly fileName: string; readonly previous: IdentifyOutcome | null }
  | { readonly status: 'done'; readonly fileName: string; readonly outcome: IdentifyOutcome }
  | { readonly status: 'failed'; readonly fileName: string; readonly message: string };

/**
 * Runs the chosen file through the worker, and again whenever the scan settings or processing
 * parameters change. A failed import keeps the file, so fixing a setting re-runs it; only the
 * latest run's answer is shown. `library` is the library in force (absent: the bundled one); a new
 * version re-runs the scan.
 */
export function useScanIdentification(client: () => IdentifyClient, scan: ScanSettings, library?: Library) {
  const [file, setFile] = useState<ScanFile | null>(null);
  const [processing, setProcessing] = useState<ProcessingSettings>(DEFAULT_PROCESSING);
  const [state, setState] = useState<ScanState>({ status: 'empty' });
  const run = useRef(0);
  const libraryRef = useRef(library);
  libraryRef.current = library;
  const libraryHash = library?.version.contentHash;

  useEffect(() => {
    if (!file) return;
    const mine = ++run.current;
    setState((s) => ({ status: 'running', fileName: file.name, previous: s.status === 'done' ? s.outcome : s.status === 'running' ? s.previous : null }));
    // The worker takes a copy: the kept bytes must survive for the next re-run.
    client()
      .identify({ name: file.name, bytes: file.bytes.slice(0) }, scan, processing, libraryRef.current)
      .then(
        (outcome) => mine === run.current && setState({ status: 'done', fileName: file.name, outcome }),
        (error: unknown) => mine === run.current && setState({ status: 'failed', fileName: file.name, message: error instanceof Error ? error.message : String(error) }),
      );
  }, [client, file, scan, processing, libraryHash]);

  /** A new file starts from the pipeline's defaults, or from the processing given (a saved scan's, run again). */
  const chooseFile = useCallback((next: ScanFile, startFrom: ProcessingSettings = DEFAULT_PROCESSING) => {
    setProcessing(startFrom);
    setFile(next);
  }, []);

  return { state, processing, setProcessing, chooseFile, file };
}
