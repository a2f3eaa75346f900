import { createFirmSchema } from '../../lib/contracts/firms';
import { createFirm } from '../../lib/server/firms/firm-service';
import { firmCallerOf } from '../../lib/server/http/acting';
import { requireIdentity } from '../../lib/server/http/guards';
import { handleApi, json, readJsonBody } from '../../lib/server/http/respond';

export const prerender = false;

/** Any signed-in person may start a firm; they become its owner. */
export const POST = handleApi(async (context, app) => {
  const identity = requireIdentity(context);
  const body = await readJsonBody(context.request, createFirmSchema);
  return json(await createFirm(app, firmCallerOf(context, identity), body.name), 201);
});
