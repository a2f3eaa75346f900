import { config } from '../../../lib/server/config';
import { ApiError } from '../../../lib/server/http/api-error';
import { handleApi, json } from '../../../lib/server/http/respond';
import { readDevInbox } from '../../../lib/server/mail/dev-inbox';

export const prerender = false;

/** Messages held by the local mail fake. Exists only in development mode. */
export const GET = handleApi(async () => {
  if (!config.isDevelopment || !config.mailInboxUrl) {
    throw new ApiError(
      'NOT_FOUND',
      'There is no API endpoint at /api/dev/inbox. The API page (/api-guide) and GET /api/openapi.json list them.',
    );
  }
  try {
    return json({ messages: await readDevInbox(config.mailInboxUrl) });
  } catch {
    throw new ApiError('SERVICE_UNAVAILABLE', 'The local mail fake does not answer. Is `npm start` still running?');
  }
});
