import { retireSchema } from '../../../../../lib/contracts/vocabulary';
import { actingPerson } from '../../../../../lib/server/http/acting';
import { requirePermission } from '../../../../../lib/server/http/guards';
import { readParams, uuidParam } from '../../../../../lib/server/http/params';
import { handleApi, json, readJsonBody } from '../../../../../lib/server/http/respond';
import { setRegionRetired } from '../../../../../lib/server/vocabulary/curation-service';

export const prerender = false;

/** Retires a region (no new uploads; its records stay) or puts it back in use. */
export const POST = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'vocabulary', 'manage');
  const { id } = readParams(context, { id: uuidParam });
  const body = await readJsonBody(context.request, retireSchema);
  return json({ region: await setRegionRetired(app, actingPerson(context, identity), id, body.retired) });
});
