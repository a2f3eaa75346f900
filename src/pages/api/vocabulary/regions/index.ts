import { createRegionSchema } from '../../../../lib/contracts/vocabulary';
import { actingPerson } from '../../../../lib/server/http/acting';
import { requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';
import { createRegion } from '../../../../lib/server/vocabulary/vocabulary-service';

export const prerender = false;

/** Adds a region (stewards and platform admins). */
export const POST = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'vocabulary', 'manage');
  const body = await readJsonBody(context.request, createRegionSchema);
  return json({ region: await createRegion(app, actingPerson(context, identity), body) }, 201);
});
