// Task records: enqueued → processing → succeeded | failed, as GET /tasks/:uid and GET /tasks show them.
import type { ErrorBody } from '../errors';
import { enqueuedDetails, type Operation } from './operations';

export type TaskStatus = 'enqueued' | 'processing' | 'succeeded' | 'failed' | 'canceled';

export interface Task {
  uid: number;
  batchUid: number | null;
  indexUid: string | null;
  status: TaskStatus;
  type: Operation['type'];
  canceledBy: null;
  details: Record<string, unknown>;
  error: ErrorBody | null;
  duration: string | null;
  enqueuedAt: string;
  startedAt: string | null;
  finishedAt: string | null;
}

/** A task with the change it carries (kept until it has run). */
export interface StoredTask extends Task {
  operation?: Operation;
}

export function newTask(uid: number, operation: Operation): StoredTask {
  return {
    uid,
    batchUid: null,
    indexUid: operation.indexUid,
    status: 'enqueued',
    type: operation.type,
    canceledBy: null,
    details: enqueuedDetails(operation),
    error: null,
    duration: null,
    enqueuedAt: new Date().toISOString(),
    startedAt: null,
    finishedAt: null,
    operation,
  };
}

/** The short form a write answers with (HTTP 202). */
export function summary(task: Task) {
  return { taskUid: task.uid, indexUid: task.indexUid, status: task.status, type: task.type, enqueuedAt: task.enqueuedAt };
}

export function publicTask(task: StoredTask): Task {
  const { operation: _operation, ...rest } = task;
  return rest;
}

/** ISO 8601 duration, as the task's `duration`. */
export function isoDuration(fromIso: string, toIso: string): string {
  const seconds = Math.max(0, Date.parse(toIso) - Date.parse(fromIso)) / 1000;
  return `PT${seconds.toFixed(3).replace(/\.?0+$/, '') || '0'}S`;
}
