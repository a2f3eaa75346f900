import { authenticateFirmKey } from '../../../lib/server/auth/firm-key';
import { describeKeyCaller } from '../../../lib/server/firms/partner-service';
import { handleApi, json } from '../../../lib/server/http/respond';

export const prerender = false;

/** For partner scripts: which firm the presented API key belongs to and what it may do. */
export const GET = handleApi(async (context, app) => {
  const caller = await authenticateFirmKey(app.auth, context.request.headers);
  return json(await describeKeyCaller(app, caller));
});
