import { handleApi, jsonText } from '../../lib/server/http/respond';
import { openApiText } from '../../lib/server/openapi/openapi-document';

export const prerender = false;

/** The OpenAPI 3 description of the API, generated from the zod schemas the endpoints parse with. */
export const GET = handleApi((_context, app) => jsonText(openApiText(app.appUrl)));
