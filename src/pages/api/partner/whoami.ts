import { appContext } from '../../../lib/server/app-context';
import { authenticateFirmKey } from '../../../lib/server/auth/firm-key';
import { handleApi, json } from '../../../lib/server/http/respond';

export const prerender = false;

/** For partner scripts: which firm the presented API key belongs to and what it may do. */
export const GET = handleApi(async (context) => {
  const { auth, database } = appContext();
  const caller = await authenticateFirmKey(auth, context.request.headers);
  const firm = await database.db
    .selectFrom('organization')
    .select(['id', 'name'])
    .where('id', '=', caller.firmId)
    .executeTakeFirstOrThrow();
  return json({ firm, key: { id: caller.keyId, name: caller.keyName }, may: ['submission:create'] });
});
