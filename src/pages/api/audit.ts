import { auditQuerySchema } from '../../lib/contracts/audit';
import { listAudit } from '../../lib/server/audit/audit-service';
import { requireAnyPermission } from '../../lib/server/http/guards';
import { handleApi, json, readQuery } from '../../lib/server/http/respond';

export const prerender = false;

/**
 * The audit log: everything for platform admins; the active firm's entries for its owner and admins.
 * `?limit=&offset=&person=&kind=&from=YYYY-MM-DD&to=YYYY-MM-DD`.
 */
export const GET = handleApi(async (context, app) => {
  const identity = await requireAnyPermission(context, [
    ['audit', 'read-all'],
    ['firm', 'read-audit'],
  ]);
  return json(await listAudit(app, identity, readQuery(context.url, auditQuerySchema)));
});
