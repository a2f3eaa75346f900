// Tasks: one by uid, and the filtered, paged list (newest first).
import type { Task } from '../engine/tasks';
import { SearchFakeError } from '../errors';
import { ok, type RouteContext, route } from './routes';

function list(ctx: RouteContext, name: string): string[] | null {
  const raw = ctx.query.get(name);
  if (raw === null || raw === '*') return null;
  return raw.split(',').map((s) => s.trim());
}

function integer(ctx: RouteContext, name: string, fallback: number | null): number | null {
  const raw = ctx.query.get(name);
  if (raw === null) return fallback;
  if (!/^\d+$/.test(raw)) {
    throw new SearchFakeError(
      `invalid_task_${name}`,
      `Invalid value in parameter \`${name}\`: could not parse \`${raw}\` as a positive integer`,
    );
  }
  return Number(raw);
}

export const taskRoutes = [
  route('GET', '/tasks/:uid', (ctx) => {
    const raw = ctx.params.uid as string;
    if (!/^\d+$/.test(raw))
      throw new SearchFakeError(
        'invalid_task_uids',
        `Invalid value in parameter \`taskUid\`: could not parse \`${raw}\` as a positive integer`,
      );
    return ok(ctx.engine.getTask(Number(raw)));
  }),
  route('GET', '/tasks', (ctx) => {
    const uids = list(ctx, 'uids')?.map(Number);
    const statuses = list(ctx, 'statuses');
    const types = list(ctx, 'types');
    const indexUids = list(ctx, 'indexUids');
    const limit = integer(ctx, 'limit', 20) as number;
    const from = integer(ctx, 'from', null);
    const reverse = ctx.query.get('reverse') === 'true';
    const matching = ctx.engine
      .allTasks()
      .filter(
        (t: Task) =>
          (!uids || uids.includes(t.uid)) &&
          (!statuses || statuses.includes(t.status)) &&
          (!types || types.includes(t.type)) &&
          (!indexUids || (t.indexUid !== null && indexUids.includes(t.indexUid))),
      );
    const ordered = reverse ? matching : [...matching].reverse();
    const startAt = from === null ? 0 : ordered.findIndex((t) => (reverse ? t.uid >= from : t.uid <= from));
    const page = startAt < 0 ? [] : ordered.slice(startAt, startAt + limit);
    const next = startAt < 0 ? null : (ordered[startAt + limit]?.uid ?? null);
    return ok({ results: page, total: matching.length, limit, from: page[0]?.uid ?? null, next });
  }),
];
