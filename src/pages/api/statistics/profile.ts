import { profileOptionsSchema } from '../../../lib/contracts/statistics';
import { requirePermission } from '../../../lib/server/http/guards';
import { handleApi, jsonText } from '../../../lib/server/http/respond';
import { readStatisticsQuery } from '../../../lib/server/http/statistics-query';
import { statisticsRuntime } from '../../../lib/server/statistics/statistics-engine';
import { selectionProfile } from '../../../lib/server/statistics/statistics-service';

export const prerender = false;

/** Depth profiles of a selection (wn, LL, e0, Cc, σ'p, OCR) and the σ'v0 line (?waterTableM=1). */
export const GET = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'bank', 'statistics');
  const { selection, options } = readStatisticsQuery(context.url, profileOptionsSchema);
  return jsonText(await selectionProfile(app, statisticsRuntime(), identity, selection, options));
});
