import { correlationOptionsSchema } from '../../../lib/contracts/statistics';
import { requirePermission } from '../../../lib/server/http/guards';
import { handleApi, jsonText } from '../../../lib/server/http/respond';
import { readStatisticsQuery } from '../../../lib/server/http/statistics-query';
import { statisticsRuntime } from '../../../lib/server/statistics/statistics-engine';
import { selectionCorrelation } from '../../../lib/server/statistics/statistics-service';

export const prerender = false;

/** One correlation chart of a selection (?pair=cc-ll…): points, OLS line, bands, published lines and bias. */
export const GET = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'bank', 'statistics');
  const { selection, options } = readStatisticsQuery(context.url, correlationOptionsSchema);
  return jsonText(await selectionCorrelation(app, statisticsRuntime(), identity, selection, options));
});
