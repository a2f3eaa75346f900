import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, it } from 'vitest';
import { previewEstimate } from '../../src/lib/consolidation';
import { estimatePreviewSchema } from '../../src/lib/schemas/estimate-preview';

it("the README's preview example is a valid request that the engine computes", () => {
  const readme = readFileSync(join(import.meta.dirname, '../../README.md'), 'utf8');
  const section = readme.slice(readme.indexOf('### `POST /api/estimates/preview`'));
  const example = /```json\n([\s\S]*?)```/.exec(section)?.[1] ?? '';
  const parsed = estimatePreviewSchema.safeParse(JSON.parse(example));
  expect(parsed.error?.issues ?? []).toEqual([]);
  const result = previewEstimate(parsed.data as NonNullable<typeof parsed.data>);
  expect(result.settlement.total).toBeGreaterThan(0);
  expect(result.ranges).not.toBeNull();
});
