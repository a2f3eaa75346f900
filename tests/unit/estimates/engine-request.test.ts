// What the browser's engine worker answers: the engine's own result, or one issue per field.
import { describe, expect, it } from 'vitest';
import { readmePreviewExample } from '../../../scripts/lib/readme-preview-example.mjs';
import { answerEngineRequest } from '../../../src/components/estimates/engine-request';
import { previewEstimate } from '../../../src/lib/consolidation';
import { estimatePreviewSchema } from '../../../src/lib/schemas/estimate-preview';

const example = readmePreviewExample() as { layers: Record<string, unknown>[] } & Record<string, unknown>;

describe('engine worker request', () => {
  it('answers with the same result as the preview API computes', () => {
    const answer = answerEngineRequest({ id: 7, body: example });
    expect(answer.ok).toBe(true);
    expect(answer.id).toBe(7);
    if (answer.ok) expect(answer.result).toEqual(previewEstimate(estimatePreviewSchema.parse(example)));
  });

  it('names the field of a value that does not fit the schema', () => {
    const body = { ...example, layers: [{ ...example.layers[0], thickness: -1 }] };
    const answer = answerEngineRequest({ id: 1, body });
    expect(answer).toMatchObject({ id: 1, ok: false, kind: 'invalid' });
    if (!answer.ok) expect(answer.issues.map((i) => i.path)).toContain('layers.0.thickness');
  });

  it('names the field of a physically impossible combination', () => {
    const body = { ...example, layers: [{ ...example.layers[0], unitWeightBelowWater: 9 }] };
    const answer = answerEngineRequest({ id: 2, body });
    expect(answer).toMatchObject({ id: 2, ok: false, kind: 'impossible' });
    if (!answer.ok) expect(answer.issues.map((i) => i.path)).toEqual(['layers.0.unitWeightBelowWater']);
  });
});
