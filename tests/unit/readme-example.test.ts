import { expect, it } from 'vitest';
import { readmePreviewExample } from '../../scripts/lib/readme-preview-example.mjs';
import { previewEstimate } from '../../src/lib/consolidation';
import { estimatePreviewSchema } from '../../src/lib/schemas/estimate-preview';

it("the README's preview example is a valid request that the engine computes", () => {
  const parsed = estimatePreviewSchema.safeParse(readmePreviewExample());
  expect(parsed.error?.issues ?? []).toEqual([]);
  const result = previewEstimate(parsed.data as NonNullable<typeof parsed.data>);
  expect(result.settlement.total).toBeGreaterThan(0);
  expect(result.ranges).not.toBeNull();
});
