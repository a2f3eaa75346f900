/**
 * Keeps the estimate's figures following the form without ever blocking typing: the engine runs
 * in a worker, a new input waits `debounceMs` for typing to pause, and a run made stale by a newer
 * input is cancelled (its worker terminated and replaced) so its answer never reaches the page.
 * Pure logic over an injected worker factory and timers, so it is tested without a browser.
 */
import type { EngineAnswer, EngineRequest } from './engine-request';

/** The part of a Web Worker the runner uses. */
export interface EngineWorkerLike {
  postMessage(message: EngineRequest): void;
  terminate(): void;
  onmessage: ((event: { data: EngineAnswer }) => void) | null;
  onerror: ((event: { message?: string }) => void) | null;
}

export type RunnerState = 'idle' | 'waiting' | 'running';

export interface LatestRunnerOptions {
  spawn: () => EngineWorkerLike;
  onAnswer: (answer: EngineAnswer) => void;
  onState?: (state: RunnerState) => void;
  onFailure?: (message: string) => void;
  debounceMs?: number;
  setTimer?: (run: () => void, ms: number) => unknown;
  clearTimer?: (handle: unknown) => void;
}

export class LatestRunner {
  private worker: EngineWorkerLike | null = null;
  private inFlight: number | null = null;
  private latest = 0;
  private pending: unknown = undefined;
  private timer: unknown = null;
  private readonly debounceMs: number;
  private readonly setTimer: (run: () => void, ms: number) => unknown;
  private readonly clearTimer: (handle: unknown) => void;

  constructor(private readonly options: LatestRunnerOptions) {
    this.debounceMs = options.debounceMs ?? 250;
    this.setTimer = options.setTimer ?? ((run, ms) => setTimeout(run, ms));
    this.clearTimer = options.clearTimer ?? ((handle) => clearTimeout(handle as ReturnType<typeof setTimeout>));
  }

  /** Asks for a run with this form body; only the newest body asked for is ever answered. */
  request(body: unknown): void {
    this.latest += 1;
    this.pending = body;
    if (this.timer !== null) this.clearTimer(this.timer);
    this.timer = this.setTimer(() => this.start(), this.debounceMs);
    this.options.onState?.('waiting');
  }

  /** Stops everything; no answer arrives afterwards. */
  dispose(): void {
    if (this.timer !== null) this.clearTimer(this.timer);
    this.timer = null;
    this.retire();
    this.latest += 1;
  }

  private start(): void {
    this.timer = null;
    if (this.inFlight !== null) this.retire();
    const worker = this.worker ?? this.hire();
    this.inFlight = this.latest;
    this.options.onState?.('running');
    worker.postMessage({ id: this.latest, body: this.pending });
  }

  private hire(): EngineWorkerLike {
    const worker = this.options.spawn();
    worker.onmessage = (event) => {
      if (event.data.id !== this.inFlight) return;
      this.inFlight = null;
      if (event.data.id !== this.latest) return;
      this.options.onState?.(this.timer === null ? 'idle' : 'waiting');
      this.options.onAnswer(event.data);
    };
    worker.onerror = (event) => {
      this.retire();
      this.options.onState?.('idle');
      this.options.onFailure?.(event.message ?? 'The estimate could not be computed in this browser.');
    };
    this.worker = worker;
    return worker;
  }

  /** Terminates the worker (cancelling any run in it); the next run starts a fresh one. */
  private retire(): void {
    this.worker?.terminate();
    this.worker = null;
    this.inFlight = null;
  }
}
