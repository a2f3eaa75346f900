// The preview worker pool: the engine's own numbers from a worker thread, impossible inputs as 422,
// a full queue as 503 with Retry-After, cancelled requests dropped without harming the pool.
import { afterAll, describe, expect, it } from 'vitest';
import { readmePreviewExample } from '../../../scripts/lib/readme-preview-example.mjs';
import { previewEstimate } from '../../../src/lib/consolidation';
import { type EstimatePreviewInput, estimatePreviewSchema } from '../../../src/lib/schemas/estimate-preview';
import { DomainError } from '../../../src/lib/server/errors';
import { createPreviewPool, type PreviewPool } from '../../../src/lib/server/estimates/preview-pool';
import { ERROR_STATUS } from '../../../src/lib/server/http/api-error';
import { type HttpError, toHttpError } from '../../../src/lib/server/http/error-mapper';

const DEV_ENTRY = new URL('../../../src/lib/server/estimates/preview-task-dev.mjs', import.meta.url).href;
const example = estimatePreviewSchema.parse(readmePreviewExample());
const heavy: EstimatePreviewInput = {
  ...example,
  options: { ...example.options, monteCarlo: { realisations: 20_000, seed: 3 } },
};

const pools: PreviewPool[] = [];
const pool = (threads: number, maxQueue: number) => {
  const made = createPreviewPool({ filename: DEV_ENTRY, threads, maxQueue });
  pools.push(made);
  return made;
};
afterAll(() => Promise.all(pools.map((p) => p.close())));

/** The refusal as the API answers it (through the one error mapper). */
async function refusal(promise: Promise<unknown>): Promise<HttpError> {
  try {
    await promise;
  } catch (error) {
    const http = error instanceof DomainError ? toHttpError(error) : null;
    if (http) return http;
    throw error;
  }
  throw new Error('expected a refusal');
}

describe('preview worker pool', () => {
  it("answers with the engine's own result, as JSON text", async () => {
    const text = await pool(1, 4).run(example);
    expect(JSON.parse(text)).toEqual(JSON.parse(JSON.stringify(previewEstimate(example))));
  });

  it('refuses a physically impossible profile with 422 and the field named', async () => {
    const layer = { ...(example.layers[0] as EstimatePreviewInput['layers'][number]), unitWeightBelowWater: 9.5 };
    const error = await refusal(pool(1, 4).run({ ...example, layers: [layer] }));
    expect(error.code).toBe('UNPROCESSABLE');
    expect(ERROR_STATUS[error.code]).toBe(422);
    expect(error.issues?.map((i) => i.path)).toEqual(['layers.0.unitWeightBelowWater']);
  });

  it('refuses at once with 503 and Retry-After when every thread is busy and the queue is full', async () => {
    const small = pool(1, 1);
    const runs = Array.from({ length: 5 }, () =>
      small.run(example).then(
        () => 'done',
        (error: unknown) => error,
      ),
    );
    const outcomes = await Promise.all(runs);
    // one running, one waiting; the other three refused
    expect(outcomes.filter((o) => o === 'done')).toHaveLength(2);
    const refused = outcomes.filter((o) => o instanceof DomainError).map((o) => toHttpError(o) as HttpError);
    expect(refused).toHaveLength(3);
    for (const error of refused) {
      expect(error.code).toBe('SERVICE_UNAVAILABLE');
      expect(ERROR_STATUS[error.code]).toBe(503);
      expect(Number(error.headers?.['retry-after'])).toBeGreaterThanOrEqual(1);
    }
    expect(small.stats()).toMatchObject({ threads: 1, queued: 0, maxQueue: 1, completed: 2 });
  });

  it('drops a preview whose request was closed, and keeps working', async () => {
    const p = pool(1, 2);
    const controller = new AbortController();
    const cancelled = p.run(heavy, controller.signal);
    controller.abort();
    expect((await refusal(cancelled)).code).toBe('BAD_REQUEST');
    expect(JSON.parse(await p.run(example)).settlement.total).toBeGreaterThan(0);
  });
});
