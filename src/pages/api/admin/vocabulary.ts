import { requirePermission } from '../../../lib/server/http/guards';
import { handleApi, json } from '../../../lib/server/http/respond';
import { listCuratedVocabulary } from '../../../lib/server/vocabulary/curation-service';

export const prerender = false;

/** Regions and units with synonyms, retired and merged state and record counts (stewards, platform admin). */
export const GET = handleApi(async (context, app) => {
  await requirePermission(context, 'vocabulary', 'manage');
  return json(await listCuratedVocabulary(app));
});
