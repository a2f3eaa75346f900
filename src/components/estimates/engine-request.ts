/**
 * What the estimate page's engine worker does with one message: validate the form's body with the
 * shared schema, run the engine, and answer with the result or with one issue per field — the
 * schema's (a value that does not fit) and the engine's (a combination that is physically
 * impossible) alike, so the form can show each beside its field. Pure: no DOM, no worker globals.
 */
import { EngineInputError, type EstimatePreviewResult, previewEstimate } from '../../lib/consolidation';
import { estimatePreviewSchema } from '../../lib/schemas/estimate-preview';

export interface EngineRequest {
  /** Increases with every run the page asks for; answers carry it back so stale ones are dropped. */
  id: number;
  body: unknown;
}

export interface FieldIssue {
  path: string;
  message: string;
}

export type EngineAnswer =
  | { id: number; ok: true; result: EstimatePreviewResult; elapsedMs: number }
  | { id: number; ok: false; kind: 'invalid' | 'impossible'; issues: FieldIssue[] };

export function answerEngineRequest(request: EngineRequest, now: () => number = () => performance.now()): EngineAnswer {
  const parsed = estimatePreviewSchema.safeParse(request.body);
  if (!parsed.success) {
    const issues = parsed.error.issues.map((issue) => ({ path: issue.path.map(String).join('.'), message: issue.message }));
    return { id: request.id, ok: false, kind: 'invalid', issues };
  }
  const started = now();
  try {
    const result = previewEstimate(parsed.data);
    return { id: request.id, ok: true, result, elapsedMs: now() - started };
  } catch (error) {
    if (error instanceof EngineInputError) return { id: request.id, ok: false, kind: 'impossible', issues: [...error.issues] };
    throw error;
  }
}
