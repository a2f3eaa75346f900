import { appContext } from '../../../lib/server/app-context';
import { rememberedMapping } from '../../../lib/server/contribute/prepare-upload';
import { activeFirmId, requirePermission } from '../../../lib/server/http/guards';
import { handleApi, json } from '../../../lib/server/http/respond';

export const prerender = false;

/** The column choices the firm made last time (header → field and unit), used to pre-fill the mapping. */
export const GET = handleApi(async (context) => {
  const identity = await requirePermission(context, 'submission', 'create');
  return json({ mapping: await rememberedMapping(appContext().database.db, activeFirmId(identity)) });
});
