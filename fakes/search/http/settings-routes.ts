// Settings: the whole object (GET, PATCH, DELETE) and one setting per route (GET, PUT or PATCH, DELETE).
import { defaultSettings, SETTING_ROUTES, type Settings } from '../engine/settings';
import { mergeSettings } from '../engine/settings-validation';
import { checkUid, indexOf } from './index-routes';
import { parseJson } from './request';
import { accepted, ok, type Reply, type RouteContext, route } from './routes';

function shown(settings: Settings): Settings {
  return { ...settings, sortableAttributes: [...settings.sortableAttributes].sort(), stopWords: [...settings.stopWords].sort() };
}

function current(ctx: RouteContext, uid: string): Settings {
  return ctx.engine.indexes.get(uid)?.settings ?? defaultSettings();
}

async function update(ctx: RouteContext, changes: Record<string, unknown>): Promise<Reply> {
  const uid = checkUid(ctx.params.uid as string);
  mergeSettings(current(ctx, uid), changes);
  return accepted(ctx.engine.enqueue({ type: 'settingsUpdate', indexUid: uid, changes }));
}

const allReset = () => Object.fromEntries(Object.values(SETTING_ROUTES).map((r) => [r.key, null]));

export const settingsRoutes = [
  route('GET', '/indexes/:uid/settings', (ctx) => ok(shown(indexOf(ctx).settings))),
  route('PATCH', '/indexes/:uid/settings', async (ctx) =>
    update(ctx, parseJson(await ctx.body(), true) as Record<string, unknown>),
  ),
  route('DELETE', '/indexes/:uid/settings', (ctx) => update(ctx, allReset())),
  ...Object.entries(SETTING_ROUTES).flatMap(([segment, { key, method }]) => [
    route('GET', `/indexes/:uid/settings/${segment}`, (ctx) => ok(shown(indexOf(ctx).settings)[key])),
    route(method, `/indexes/:uid/settings/${segment}`, async (ctx) => update(ctx, { [key]: parseJson(await ctx.body(), true) })),
    route('DELETE', `/indexes/:uid/settings/${segment}`, (ctx) => update(ctx, { [key]: null })),
  ]),
];
