import { overviewOptionsSchema } from '../../../lib/contracts/statistics';
import { requirePermission } from '../../../lib/server/http/guards';
import { handleApi, jsonText } from '../../../lib/server/http/respond';
import { readStatisticsQuery } from '../../../lib/server/http/statistics-query';
import { statisticsRuntime } from '../../../lib/server/statistics/statistics-engine';
import { selectionOverview } from '../../../lib/server/statistics/statistics-service';

export const prerender = false;

/** Figures of a bank selection (query string as the bank browser's): every parameter, six correlations, published bias. */
export const GET = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'bank', 'statistics');
  const { selection, options } = readStatisticsQuery(context.url, overviewOptionsSchema);
  return jsonText(await selectionOverview(app, statisticsRuntime(), identity, selection, options));
});
