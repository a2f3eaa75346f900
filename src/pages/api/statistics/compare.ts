import { compareBodySchema, compareOptionsSchema } from '../../../lib/schemas/statistics-request';
import { requirePermission } from '../../../lib/server/http/guards';
import { handleApi, jsonText, readJsonBody } from '../../../lib/server/http/respond';
import { readStatisticsQuery } from '../../../lib/server/http/statistics-query';
import { statisticsRuntime } from '../../../lib/server/statistics/statistics-engine';
import { compareSiteResults } from '../../../lib/server/statistics/statistics-service';

export const prerender = false;

/** Where site results sit in a selection: body { values: { compressionIndex: [0.8, 1.1], … } } in SI units. */
export const POST = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'bank', 'statistics');
  const { selection, options } = readStatisticsQuery(context.url, compareOptionsSchema);
  const body = await readJsonBody(context.request, compareBodySchema);
  return jsonText(await compareSiteResults(app, statisticsRuntime(), identity, selection, options, body));
});
