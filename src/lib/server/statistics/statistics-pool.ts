/**
 * The statistics runtime: a pool of worker threads (piscina) that runs the core on a selection's
 * columns, with a bounded queue (a full queue is refused at once with BusyError → 503 and
 * Retry-After, like the preview pool), and the cache of answers. Services receive it as a parameter,
 * so tests and scripts make their own (createStatisticsRuntime) and the app one per process
 * (statistics-engine.ts).
 */
import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';
import { BusyError, UnprocessableError } from '../errors';
import { transferListOf } from './columns-builder';
import { ResultCache } from './result-cache';
import type { StatisticsTask, StatisticsTaskOutcome } from './statistics-task';

export interface StatisticsRuntimeOptions {
  /** File URL or path of the worker entry (bundled statistics-worker.mjs, or statistics-task-dev.mjs). */
  workerFile: string;
  /** Secret of the records' masking keys (record-key.ts); long-lived, never rotated. */
  recordKeySecret: string;
  threads?: number;
  maxQueue?: number;
  /** Characters of cached answers kept (default 64 million, about 128 MB). */
  cacheChars?: number;
}

export interface StatisticsRuntime {
  readonly recordKeySecret: string;
  readonly cache: ResultCache;
  /** JSON text of the task's answer; throws UnprocessableError (input the core refuses) or BusyError. */
  run(task: StatisticsTask): Promise<string>;
  close(): Promise<void>;
}

export function createStatisticsRuntime(options: StatisticsRuntimeOptions): StatisticsRuntime {
  if (options.recordKeySecret.length < 32) throw new Error('The record-key secret must be at least 32 characters.');
  const threads = options.threads ?? Math.max(1, availableParallelism() - 1);
  const maxQueue = options.maxQueue ?? 4 * threads;
  const pool = new Piscina<StatisticsTask, StatisticsTaskOutcome>({
    filename: options.workerFile,
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
  return {
    recordKeySecret: options.recordKeySecret,
    cache: new ResultCache(options.cacheChars ?? 64_000_000),
    async run(task) {
      let outcome: StatisticsTaskOutcome;
      try {
        outcome = await pool.run(task, { transferList: transferListOf(task.columns) });
      } catch (error) {
        if (error instanceof Error && error.message === 'Task queue is at limit') {
          throw new BusyError(
            'Too many statistics are being computed right now. Try again in a few seconds (see Retry-After).',
            retryAfterSeconds(),
          );
        }
        throw error;
      }
      if (outcome.ok) return outcome.json;
      throw new UnprocessableError(`These statistics cannot be computed: ${outcome.message}`);
    },
    close: () => pool.close(),
  };
}
