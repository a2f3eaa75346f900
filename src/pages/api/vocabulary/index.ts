import { requireIdentity } from '../../../lib/server/http/guards';
import { handleApi, json } from '../../../lib/server/http/respond';
import { listVocabulary } from '../../../lib/server/vocabulary/vocabulary-service';

export const prerender = false;

/** Regions and geological units, for any signed-in person. */
export const GET = handleApi(async (context, app) => {
  requireIdentity(context);
  return json(await listVocabulary(app));
});
