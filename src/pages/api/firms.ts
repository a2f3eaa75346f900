import { createFirmSchema } from '../../lib/schemas/firm';
import { appContext } from '../../lib/server/app-context';
import { createFirm, firmDepsFrom } from '../../lib/server/firms/firm-service';
import { requireIdentity } from '../../lib/server/http/guards';
import { handleApi, json, readJsonBody } from '../../lib/server/http/respond';

export const prerender = false;

/** Any signed-in person may start a firm; they become its owner. */
export const POST = handleApi(async (context) => {
  const identity = requireIdentity(context);
  const body = await readJsonBody(context.request, createFirmSchema);
  const { auth, database } = appContext();
  const firm = await createFirm(firmDepsFrom(context, identity, { auth, db: database.db }), body.name);
  return json({ firm }, 201);
});
