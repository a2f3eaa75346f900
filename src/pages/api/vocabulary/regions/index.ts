import { createRegionSchema } from '../../../../lib/schemas/vocabulary';
import { appContext } from '../../../../lib/server/app-context';
import { createRegion } from '../../../../lib/server/bank/vocabulary-service';
import { actingPerson } from '../../../../lib/server/http/curator';
import { requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Adds a region (stewards and platform admins). */
export const POST = handleApi(async (context) => {
  const identity = await requirePermission(context, 'vocabulary', 'manage');
  const body = await readJsonBody(context.request, createRegionSchema);
  const region = await createRegion(appContext().database.db, actingPerson(identity, context.clientAddress), body);
  return json({ region }, 201);
});
