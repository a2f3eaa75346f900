import { updateRegionSchema } from '../../../../lib/schemas/vocabulary';
import { appContext } from '../../../../lib/server/app-context';
import { updateRegion } from '../../../../lib/server/bank/vocabulary-service';
import { actingPerson } from '../../../../lib/server/http/curator';
import { requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Renames or re-describes a region (stewards and platform admins). */
export const PATCH = handleApi(async (context) => {
  const identity = await requirePermission(context, 'vocabulary', 'manage');
  const body = await readJsonBody(context.request, updateRegionSchema);
  const region = await updateRegion(
    appContext().database.db,
    actingPerson(identity, context.clientAddress),
    context.params.id ?? '',
    body,
  );
  return json({ region });
});
