import { updateUnitSchema } from '../../../../lib/schemas/vocabulary';
import { appContext } from '../../../../lib/server/app-context';
import { updateUnit } from '../../../../lib/server/bank/vocabulary-service';
import { actingPerson } from '../../../../lib/server/http/curator';
import { requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Edits a geological unit (stewards and platform admins). */
export const PATCH = handleApi(async (context) => {
  const identity = await requirePermission(context, 'vocabulary', 'manage');
  const body = await readJsonBody(context.request, updateUnitSchema);
  const unit = await updateUnit(
    appContext().database.db,
    actingPerson(identity, context.clientAddress),
    context.params.id ?? '',
    body,
  );
  return json({ unit });
});
