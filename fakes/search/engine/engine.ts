// The service's state: its indexes and the task queue that changes them. Writes are queued and
// applied in order, a batch at a time; each batch is saved to the data folder before its tasks are
// reported as succeeded.
import { SearchFakeError } from '../errors';
import { applyOperation, type Operation } from './operations';
import type { SearchIndex } from './search-index';
import type { SnapshotStore } from './snapshot';
import { isoDuration, newTask, publicTask, type StoredTask, summary, type Task } from './tasks';

const MAX_KEPT_TASKS = 10_000;

export class Engine {
  readonly indexes = new Map<string, SearchIndex>();
  private readonly tasks: StoredTask[] = [];
  private readonly byUid = new Map<number, StoredTask>();
  private nextTaskUid = 0;
  private nextBatchUid = 0;
  private running: Promise<void> | null = null;

  constructor(private readonly store: SnapshotStore | null) {
    if (!store) return;
    for (const index of store.loadIndexes()) this.indexes.set(index.uid, index);
    const saved = store.loadTasks();
    if (saved) {
      this.nextTaskUid = saved.nextTaskUid;
      this.nextBatchUid = saved.nextBatchUid;
      for (const task of saved.tasks) {
        if (task.status === 'processing') task.status = 'enqueued';
        this.tasks.push(task);
        this.byUid.set(task.uid, task);
      }
      if (this.tasks.some((t) => t.status === 'enqueued')) this.schedule();
    }
  }

  enqueue(operation: Operation) {
    const task = newTask(this.nextTaskUid, operation);
    this.nextTaskUid += 1;
    this.tasks.push(task);
    this.byUid.set(task.uid, task);
    this.schedule();
    return summary(task);
  }

  getTask(uid: number): Task {
    const task = this.byUid.get(uid);
    if (!task) throw new SearchFakeError('task_not_found', `Task \`${uid}\` not found.`);
    return publicTask(task);
  }

  allTasks(): Task[] {
    return this.tasks.map(publicTask);
  }

  /** Resolves once every task enqueued so far has finished (used at shutdown and in tests). */
  async idle(): Promise<void> {
    while (this.running) await this.running;
  }

  /** Keeps the newest finished tasks (and every unfinished one), as the engine caps its task history. */
  private forgetOldTasks(): void {
    const excess = this.tasks.length - MAX_KEPT_TASKS;
    if (excess <= 0) return;
    let removed = 0;
    for (let i = 0; i < this.tasks.length && removed < excess; ) {
      const task = this.tasks[i] as StoredTask;
      if (task.operation) {
        i += 1;
        continue;
      }
      this.tasks.splice(i, 1);
      this.byUid.delete(task.uid);
      removed += 1;
    }
  }

  private schedule(): void {
    if (this.running) return;
    this.running = new Promise<void>((resolve) => setImmediate(resolve))
      .then(() => this.drain())
      .finally(() => {
        this.running = null;
        if (this.tasks.some((t) => t.status === 'enqueued')) this.schedule();
      });
  }

  private async drain(): Promise<void> {
    const batch = this.tasks.filter((t) => t.status === 'enqueued');
    if (batch.length === 0) return;
    const batchUid = this.nextBatchUid;
    this.nextBatchUid += 1;
    const startedAt = new Date().toISOString();
    for (const task of batch) Object.assign(task, { status: 'processing', startedAt, batchUid });
    await new Promise((resolve) => setTimeout(resolve, 1));

    const outcomes = new Map<number, { details?: Record<string, unknown>; error?: SearchFakeError }>();
    const touched = new Set<string>();
    for (const task of batch) {
      const operation = task.operation as Operation;
      try {
        outcomes.set(task.uid, { details: applyOperation(this.indexes, operation) });
        touched.add(operation.indexUid);
      } catch (error) {
        const failure =
          error instanceof SearchFakeError
            ? error
            : new SearchFakeError('internal', error instanceof Error ? error.message : String(error));
        outcomes.set(task.uid, { error: failure });
      }
    }
    let saveError: SearchFakeError | null = null;
    if (this.store) {
      try {
        for (const uid of touched) {
          const index = this.indexes.get(uid);
          if (index) await this.store.saveIndex(index);
          else await this.store.dropIndex(uid);
        }
      } catch (error) {
        saveError = new SearchFakeError('internal', `The data folder could not be written: ${(error as Error).message}`);
      }
    }
    const finishedAt = new Date().toISOString();
    for (const task of batch) {
      const outcome = outcomes.get(task.uid);
      const error = saveError ?? outcome?.error ?? null;
      task.status = error ? 'failed' : 'succeeded';
      task.error = error ? error.toBody() : null;
      if (outcome?.details) task.details = outcome.details;
      if (error && task.type === 'documentAdditionOrUpdate') task.details = { ...task.details, indexedDocuments: 0 };
      if (error && task.type === 'documentDeletion') task.details = { ...task.details, deletedDocuments: 0 };
      task.finishedAt = finishedAt;
      task.duration = isoDuration(startedAt, finishedAt);
      delete task.operation;
    }
    this.forgetOldTasks();
    if (this.store) {
      await this.store
        .saveTasks({ nextTaskUid: this.nextTaskUid, nextBatchUid: this.nextBatchUid, tasks: this.tasks })
        .catch((error: Error) => console.error(`[search fake] could not save tasks: ${error.message}`));
    }
  }
}
