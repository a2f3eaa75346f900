/**
 * The preview as a worker-thread task: the engine runs here, off the server's event loop, and the
 * result leaves as JSON text so the main thread neither clones nor serialises the large result.
 * This module is the entry of the worker bundle (`preview-worker.mjs`, see
 * src/integrations/worker-entries.mjs); in development and tests it is loaded through tsx.
 */
import { EngineInputError, type InputIssue, previewEstimate } from '../../consolidation';
import type { EstimatePreviewInput } from '../../schemas/estimate-preview';

export type PreviewTaskOutcome = { ok: true; json: string } | { ok: false; message: string; issues: InputIssue[] };

/** Runs one preview of an already validated request; physically impossible inputs come back as issues. */
export default function previewTask(input: EstimatePreviewInput): PreviewTaskOutcome {
  try {
    return { ok: true, json: JSON.stringify(previewEstimate(input)) };
  } catch (error) {
    if (error instanceof EngineInputError) return { ok: false, message: error.message, issues: [...error.issues] };
    throw error;
  }
}
