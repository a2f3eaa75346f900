/**
 * The app's statistics runtime, started on first use: the worker entry's location comes from the
 * build (src/integrations/worker-entries.mjs), the record-key secret from the configuration.
 */
import statisticsWorkerUrl from 'virtual:claybank/statistics-worker';
import { config } from '../config';
import { BusyError } from '../errors';
import { createStatisticsRuntime, type StatisticsRuntime } from './statistics-pool';

/** 503 with Retry-After, like a busy pool: the statistics cannot run until the server is configured. */
export class StatisticsNotConfiguredError extends BusyError {}

let runtime: StatisticsRuntime | null = null;

/** The process-wide runtime; throws StatisticsNotConfiguredError when RECORD_KEY_SECRET is not set. */
export function statisticsRuntime(): StatisticsRuntime {
  if (runtime) return runtime;
  if (!config.recordKeySecret || config.recordKeySecret.length < 32) {
    throw new StatisticsNotConfiguredError(
      'Pooled statistics are not available: the server has no record-key secret (RECORD_KEY_SECRET, 32 characters or more). Tell the platform admin.',
      300,
    );
  }
  runtime = createStatisticsRuntime({ workerFile: statisticsWorkerUrl, recordKeySecret: config.recordKeySecret });
  return runtime;
}
