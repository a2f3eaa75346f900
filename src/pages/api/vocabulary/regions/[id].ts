import { updateRegionSchema } from '../../../../lib/contracts/vocabulary';
import { actingPerson } from '../../../../lib/server/http/acting';
import { requirePermission } from '../../../../lib/server/http/guards';
import { readParams, uuidParam } from '../../../../lib/server/http/params';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';
import { updateRegion } from '../../../../lib/server/vocabulary/vocabulary-service';

export const prerender = false;

/** Renames or re-describes a region (stewards and platform admins). */
export const PATCH = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'vocabulary', 'manage');
  const { id } = readParams(context, { id: uuidParam });
  const body = await readJsonBody(context.request, updateRegionSchema);
  return json({ region: await updateRegion(app, actingPerson(context, identity), id, body) });
});
