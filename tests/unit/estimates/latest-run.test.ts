// The browser runner: debounced, latest-only, stale runs cancelled — with a fake worker and fake timers.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { EngineAnswer, EngineRequest } from '../../../src/components/estimates/engine-request';
import { type EngineWorkerLike, LatestRunner, type RunnerState } from '../../../src/components/estimates/latest-run';

class FakeWorker implements EngineWorkerLike {
  posted: EngineRequest[] = [];
  terminated = false;
  onmessage: ((event: { data: EngineAnswer }) => void) | null = null;
  onerror: ((event: { message?: string }) => void) | null = null;
  postMessage(message: EngineRequest) {
    this.posted.push(message);
  }
  terminate() {
    this.terminated = true;
  }
  answer(id: number) {
    this.onmessage?.({ data: { id, ok: false, kind: 'invalid', issues: [{ path: 'x', message: `answer ${id}` }] } });
  }
}

let workers: FakeWorker[];
let answers: EngineAnswer[];
let states: RunnerState[];
let runner: LatestRunner;

beforeEach(() => {
  vi.useFakeTimers();
  workers = [];
  answers = [];
  states = [];
  runner = new LatestRunner({
    spawn: () => {
      const worker = new FakeWorker();
      workers.push(worker);
      return worker;
    },
    onAnswer: (answer) => answers.push(answer),
    onState: (state) => states.push(state),
    debounceMs: 200,
  });
});
afterEach(() => vi.useRealTimers());

describe('latest-only engine runner', () => {
  it('waits for typing to pause, then runs only the newest input', () => {
    runner.request({ v: 1 });
    vi.advanceTimersByTime(100);
    runner.request({ v: 2 });
    vi.advanceTimersByTime(100);
    runner.request({ v: 3 });
    expect(workers).toHaveLength(0);
    vi.advanceTimersByTime(200);
    expect(workers).toHaveLength(1);
    expect(workers[0]?.posted).toEqual([{ id: 3, body: { v: 3 } }]);
    workers[0]?.answer(3);
    expect(answers.map((a) => a.id)).toEqual([3]);
    expect(states).toEqual(['waiting', 'waiting', 'waiting', 'running', 'idle']);
  });

  it('cancels a run made stale by newer input: its worker is terminated and its answer never arrives', () => {
    runner.request({ v: 1 });
    vi.advanceTimersByTime(200);
    const first = workers[0] as FakeWorker;
    runner.request({ v: 2 });
    vi.advanceTimersByTime(200);
    expect(first.terminated).toBe(true);
    const second = workers[1] as FakeWorker;
    expect(second.posted).toEqual([{ id: 2, body: { v: 2 } }]);
    first.answer(1);
    second.answer(2);
    expect(answers.map((a) => a.id)).toEqual([2]);
  });

  it('drops an answer that arrives while newer input is still waiting, and reuses an idle worker', () => {
    runner.request({ v: 1 });
    vi.advanceTimersByTime(200);
    runner.request({ v: 2 });
    (workers[0] as FakeWorker).answer(1);
    expect(answers).toEqual([]);
    vi.advanceTimersByTime(200);
    expect(workers).toHaveLength(1);
    expect(workers[0]?.posted.map((p) => p.id)).toEqual([1, 2]);
    (workers[0] as FakeWorker).answer(2);
    expect(answers.map((a) => a.id)).toEqual([2]);
  });

  it('reports a worker failure and starts a fresh worker for the next input', () => {
    const failures: string[] = [];
    const failing = new LatestRunner({
      spawn: () => {
        const worker = new FakeWorker();
        workers.push(worker);
        return worker;
      },
      onAnswer: (answer) => answers.push(answer),
      onFailure: (message) => failures.push(message),
      debounceMs: 0,
    });
    failing.request({ v: 1 });
    vi.advanceTimersByTime(0);
    workers[0]?.onerror?.({ message: 'boom' });
    expect(failures).toEqual(['boom']);
    expect(workers[0]?.terminated).toBe(true);
    failing.request({ v: 2 });
    vi.advanceTimersByTime(0);
    expect(workers).toHaveLength(2);
  });

  it('answers nothing after dispose', () => {
    runner.request({ v: 1 });
    vi.advanceTimersByTime(200);
    runner.dispose();
    (workers[0] as FakeWorker).answer(1);
    runner.request({ v: 2 });
    runner.dispose();
    vi.advanceTimersByTime(500);
    expect(answers).toEqual([]);
    expect(workers).toHaveLength(1);
    expect(workers[0]?.terminated).toBe(true);
  });
});
