import { checkHealth } from '../../lib/server/health/health-service';
import { handleApi, json } from '../../lib/server/http/respond';

export const prerender = false;

/** Database, mail and search status; 503 when the database is down. */
export const GET = handleApi(async (_context, app) => {
  const report = await checkHealth(app);
  return json(report, report.status === 'down' ? 503 : 200);
});
