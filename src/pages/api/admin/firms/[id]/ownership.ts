import { passOwnershipSchema } from '../../../../../lib/contracts/people';
import { passOwnership } from '../../../../../lib/server/firms/ownership-service';
import { actingPerson } from '../../../../../lib/server/http/acting';
import { requirePermission } from '../../../../../lib/server/http/guards';
import { authIdParam, readParams } from '../../../../../lib/server/http/params';
import { handleApi, json, readJsonBody } from '../../../../../lib/server/http/respond';

export const prerender = false;

/** Passes the firm to one of its members; the owner until now becomes a firm admin; both are mailed (platform admin). */
export const POST = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'people', 'manage');
  const { id } = readParams(context, { id: authIdParam });
  const body = await readJsonBody(context.request, passOwnershipSchema);
  const result = await passOwnership(app, actingPerson(context, identity), id, body.newOwnerMemberId);
  app.kickOutbox();
  return json(result);
});
