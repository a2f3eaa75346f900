import { updateUnitSchema } from '../../../../lib/contracts/vocabulary';
import { actingPerson } from '../../../../lib/server/http/acting';
import { requirePermission } from '../../../../lib/server/http/guards';
import { readParams, uuidParam } from '../../../../lib/server/http/params';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';
import { updateUnit } from '../../../../lib/server/vocabulary/unit-service';

export const prerender = false;

/** Edits a geological unit (stewards and platform admins). */
export const PATCH = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'vocabulary', 'manage');
  const { id } = readParams(context, { id: uuidParam });
  const body = await readJsonBody(context.request, updateUnitSchema);
  return json({ unit: await updateUnit(app, actingPerson(context, identity), id, body) });
});
