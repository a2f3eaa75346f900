import { mergeUnitSchema } from '../../../../../lib/contracts/vocabulary';
import { actingPerson } from '../../../../../lib/server/http/acting';
import { requirePermission } from '../../../../../lib/server/http/guards';
import { readParams, uuidParam } from '../../../../../lib/server/http/params';
import { handleApi, json, readJsonBody } from '../../../../../lib/server/http/respond';
import { mergeUnit } from '../../../../../lib/server/vocabulary/curation-service';

export const prerender = false;

/** Merges the unit into another: its records move, its names become the other's synonyms (stewards, platform admin). */
export const POST = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'vocabulary', 'manage');
  const { id } = readParams(context, { id: uuidParam });
  const body = await readJsonBody(context.request, mergeUnitSchema);
  return json(await mergeUnit(app, actingPerson(context, identity), id, body.intoUnitId));
});
