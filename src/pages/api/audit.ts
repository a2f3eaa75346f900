import { pageQuerySchema } from '../../lib/schemas/paging';
import { listAudit } from '../../lib/server/audit/audit-service';
import { requireAnyPermission } from '../../lib/server/http/guards';
import { handleApi, json, readQuery } from '../../lib/server/http/respond';

export const prerender = false;

/** The audit log: everything for platform admins; the active firm's entries for its owner and admins. */
export const GET = handleApi(async (context, app) => {
  const identity = await requireAnyPermission(context, [
    ['audit', 'read-all'],
    ['firm', 'read-audit'],
  ]);
  const page = readQuery(context.url, pageQuerySchema);
  return json(await listAudit(app, identity, page));
});
