import { fieldMappingOf } from '../../../lib/server/contribute/field-mapping';
import { activeFirmId, requirePermission } from '../../../lib/server/http/guards';
import { handleApi, json } from '../../../lib/server/http/respond';

export const prerender = false;

/** The column choices the firm made last time (header → field and unit), used to pre-fill the mapping. */
export const GET = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'submission', 'create');
  return json(await fieldMappingOf(app, activeFirmId(identity)));
});
