/**
 * A pool of worker threads for the engine's previews (piscina), so a Monte Carlo range never runs
 * on the server's event loop. The queue is bounded: when every thread is busy and `maxQueue`
 * previews already wait, a further preview is refused at once with 503 SERVICE_UNAVAILABLE and a
 * Retry-After estimated from the recent run times, instead of waiting without limit.
 */
import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';
import type { EstimatePreviewInput } from '../../schemas/estimate-preview';
import { BusyError, MalformedRequestError, UnprocessableError } from '../errors';
import type { PreviewTaskOutcome } from './preview-task';

export interface PreviewPoolOptions {
  /** File URL or path of the worker entry (bundled preview-worker.mjs, or preview-task-dev.mjs). */
  filename: string;
  /** Worker threads; default: one fewer than the processors, at least 1, so the event loop keeps a core. */
  threads?: number;
  /** Previews that may wait for a thread; default 4 per thread. */
  maxQueue?: number;
}

export interface PreviewPool {
  /** JSON text of the preview result; throws UnprocessableError (impossible input) or BusyError (queue full). */
  run(input: EstimatePreviewInput, signal?: AbortSignal): Promise<string>;
  /** Threads, waiting previews and the queue limit, for health and benchmarks. */
  stats(): { threads: number; queued: number; maxQueue: number; completed: number };
  close(): Promise<void>;
}

export const defaultPreviewThreads = () => Math.max(1, availableParallelism() - 1);

export function createPreviewPool(options: PreviewPoolOptions): PreviewPool {
  const threads = options.threads ?? defaultPreviewThreads();
  const maxQueue = options.maxQueue ?? 4 * threads;
  const pool = new Piscina<EstimatePreviewInput, PreviewTaskOutcome>({
    filename: options.filename,
    minThreads: threads,
    maxThreads: threads,
    maxQueue,
    idleTimeout: 60_000,
  });

  const retryAfterSeconds = () => {
    const averageMs = pool.histogram.runTime.average;
    const perThread = Number.isFinite(averageMs) && averageMs > 0 ? ((pool.queueSize + threads) * averageMs) / threads : 1000;
    return Math.min(30, Math.max(1, Math.ceil(perThread / 1000)));
  };
  const busy = () =>
    new BusyError(
      'Too many estimates are being computed right now. Try again in a few seconds (see Retry-After).',
      retryAfterSeconds(),
    );

  return {
    async run(input, signal) {
      let outcome: PreviewTaskOutcome;
      try {
        outcome = await pool.run(input, signal ? { signal } : {});
      } catch (error) {
        if (error instanceof Error && error.message === 'Task queue is at limit') throw busy();
        if (error instanceof Error && error.name === 'AbortError') {
          throw new MalformedRequestError('The preview was cancelled because the request was closed.');
        }
        throw error;
      }
      if (outcome.ok) return outcome.json;
      throw new UnprocessableError(`The profile cannot be computed: ${outcome.message}`, outcome.issues);
    },
    stats: () => ({ threads, queued: pool.queueSize, maxQueue, completed: pool.completed }),
    close: () => pool.close(),
  };
}
