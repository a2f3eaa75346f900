import { switchFirmSchema } from '../../../lib/schemas/firm';
import { ApiError } from '../../../lib/server/http/api-error';
import { requireIdentity } from '../../../lib/server/http/guards';
import { handleApi, json, readJsonBody } from '../../../lib/server/http/respond';

export const prerender = false;

/** Makes one of the person's own firms the active one for this session. */
export const POST = handleApi(async (context, app) => {
  const identity = requireIdentity(context);
  const body = await readJsonBody(context.request, switchFirmSchema);
  const membership = identity.memberships.find((m) => m.firmId === body.firmId);
  if (!membership) throw new ApiError('NOT_FOUND', 'You are not a member of that firm.');
  await app.auth.api.setActiveOrganization({
    headers: context.request.headers,
    body: { organizationId: membership.firmId },
  });
  return json({ activeFirm: { id: membership.firmId, name: membership.firmName, role: membership.role } });
});
