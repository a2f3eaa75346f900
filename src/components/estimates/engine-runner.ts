/**
 * The estimate page's entry to the engine in the browser: a LatestRunner over a module Web
 * Worker (Vite bundles `engine.worker.ts` from this URL). Usage from an island:
 *   const runner = createEngineRunner({ onAnswer, onState });
 *   runner.request(formBody);   // on every change
 *   runner.dispose();           // on unmount
 */
import type { EngineAnswer } from './engine-request';
import { type EngineWorkerLike, LatestRunner, type LatestRunnerOptions } from './latest-run';

function spawnEngineWorker(): EngineWorkerLike {
  const worker = new Worker(new URL('./engine.worker.ts', import.meta.url), { type: 'module', name: 'claybank-engine' });
  const like: EngineWorkerLike = {
    postMessage: (message) => worker.postMessage(message),
    terminate: () => worker.terminate(),
    onmessage: null,
    onerror: null,
  };
  worker.onmessage = (event: MessageEvent<EngineAnswer>) => like.onmessage?.({ data: event.data });
  worker.onerror = (event: ErrorEvent) => like.onerror?.({ message: event.message });
  return like;
}

export function createEngineRunner(options: Omit<LatestRunnerOptions, 'spawn'>): LatestRunner {
  return new LatestRunner({ ...options, spawn: spawnEngineWorker });
}
