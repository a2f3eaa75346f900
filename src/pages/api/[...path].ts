import type { APIRoute } from 'astro';
import { errorResponse } from '../../lib/server/http/respond';

export const prerender = false;

/** Any API path that no endpoint serves answers in the one error shape. */
export const ALL: APIRoute = ({ url }) =>
  errorResponse(
    'NOT_FOUND',
    `There is no API endpoint at ${url.pathname}. The API page (/api-guide) and GET /api/openapi.json list them.`,
  );
