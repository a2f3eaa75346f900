import { appContext } from '../../../lib/server/app-context';
import { listVocabulary } from '../../../lib/server/bank/vocabulary-service';
import { requireIdentity } from '../../../lib/server/http/guards';
import { handleApi, json } from '../../../lib/server/http/respond';

export const prerender = false;

/** Regions and geological units, for any signed-in person. */
export const GET = handleApi(async (context) => {
  requireIdentity(context);
  return json(await listVocabulary(appContext().database.db));
});
