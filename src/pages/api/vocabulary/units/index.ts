import { createUnitSchema } from '../../../../lib/contracts/vocabulary';
import { actingPerson } from '../../../../lib/server/http/acting';
import { requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';
import { createUnit } from '../../../../lib/server/vocabulary/unit-service';

export const prerender = false;

/** Adds a geological unit (stewards and platform admins). */
export const POST = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'vocabulary', 'manage');
  const body = await readJsonBody(context.request, createUnitSchema);
  return json({ unit: await createUnit(app, actingPerson(context, identity), body) }, 201);
});
