/// <reference lib="webworker" />
// The identification runs here, off the main thread, so the screen stays responsive while the
// compound library is indexed (~0.7 s) and each scan is ranked.
import { handleRequest } from '../features/identify/handleRequest';
import type { WorkerRequest } from '../features/identify/protocol';

const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.addEventListener('message', (event: MessageEvent<WorkerRequest>) => {
  const response = handleRequest(event.data);
  // The plot's typed arrays are handed over, not copied.
  const plot = response.ok && response.kind !== 'warm-up' ? (response.kind === 'identify' ? response.outcome.plot : response.plot) : null;
  const transfer = plot ? [...new Set([plot.xCm1.buffer, plot.y.buffer])] : [];
  scope.postMessage(response, transfer as Transferable[]);
});
