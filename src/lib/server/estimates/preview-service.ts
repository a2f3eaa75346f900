/**
 * The process-wide preview pool, started on first use. The worker entry's location comes from the
 * build (src/integrations/worker-entries.mjs): the bundled preview-worker.mjs beside the server
 * code in a built app, the tsx loader under `astro dev`.
 */
import previewWorkerUrl from 'virtual:claybank/preview-worker';
import type { EstimatePreviewInput } from '../../schemas/estimate-preview';
import { createPreviewPool, type PreviewPool } from './preview-pool';

let pool: PreviewPool | null = null;

function previewPool(): PreviewPool {
  pool ??= createPreviewPool({ filename: previewWorkerUrl });
  return pool;
}

/** The preview of a validated request as JSON text, computed in a worker thread (UnprocessableError, BusyError). */
export function previewInWorker(input: EstimatePreviewInput, signal?: AbortSignal): Promise<string> {
  return previewPool().run(input, signal);
}
