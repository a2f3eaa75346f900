import { OpenAPIRegistry, OpenApiGeneratorV3, type RouteConfig } from '@asteasolutions/zod-to-openapi';
import { z } from 'zod';
import { ERROR_STATUS } from '../../contracts/errors';
import type { DocumentedRoute } from './documented-route';
import { ACCOUNT_ROUTES } from './routes-account';
import { ADMIN_ROUTES } from './routes-admin';
import { BANK_ROUTES } from './routes-bank';
import { STATISTICS_ROUTES } from './routes-statistics';

/** Every endpoint the description documents, in the order the API page shows them. */
export const DOCUMENTED_ROUTES: readonly DocumentedRoute[] = [
  ...BANK_ROUTES,
  ...STATISTICS_ROUTES,
  ...ACCOUNT_ROUTES,
  ...ADMIN_ROUTES,
];

const errorBodySchema = z
  .object({
    error: z.object({
      code: z.enum(Object.keys(ERROR_STATUS) as [keyof typeof ERROR_STATUS]),
      message: z.string().meta({ description: 'What happened and what to do.' }),
      issues: z.array(z.object({ path: z.string(), message: z.string() })).optional(),
    }),
  })
  .meta({ id: 'ErrorBody' });

const SECURITY: Record<DocumentedRoute['caller'], RouteConfig['security']> = {
  anyone: [],
  session: [{ session: [] }],
  apiKey: [{ firmKey: [] }],
};

function routeConfig(route: DocumentedRoute): RouteConfig {
  const error = {
    description: 'The one error shape; see the code and message.',
    content: { 'application/json': { schema: errorBodySchema } },
  };
  return {
    method: route.method,
    path: route.path,
    tags: [route.tag],
    summary: route.summary,
    description: `Who: ${route.who}.`,
    security: SECURITY[route.caller],
    request: {
      ...(route.params ? { params: z.object(route.params) } : {}),
      ...(route.query ? { query: route.query } : {}),
      ...(route.body
        ? {
            body: {
              required: true,
              content: Object.fromEntries(route.body.map((b) => [b.mediaType ?? 'application/json', { schema: b.schema }])),
            },
          }
        : {}),
    },
    responses: {
      [route.success.status]: { description: route.success.description },
      '4XX': error,
      '5XX': error,
    },
  };
}

/** The OpenAPI 3.0 description of the API, built from the endpoints' own zod schemas. */
export function buildOpenApiDocument(appUrl: string) {
  const registry = new OpenAPIRegistry();
  registry.registerComponent('securitySchemes', 'session', { type: 'apiKey', in: 'cookie', name: 'better-auth.session_token' });
  registry.registerComponent('securitySchemes', 'firmKey', { type: 'apiKey', in: 'header', name: 'x-api-key' });
  for (const route of DOCUMENTED_ROUTES) registry.registerPath(routeConfig(route));
  return new OpenApiGeneratorV3(registry.definitions).generateDocument({
    openapi: '3.0.3',
    info: {
      title: 'Claybank API',
      version: '1',
      description:
        'Pooled, anonymised oedometer test results. Every figure is for preliminary assessment only: pooled data of varying quality is no substitute for site investigation; follow local codes and have designs checked by a licensed engineer. Errors always have the shape ErrorBody.',
    },
    servers: [{ url: appUrl }],
  });
}

let cached: { appUrl: string; text: string } | null = null;

/** The description as JSON text, built once per process. */
export function openApiText(appUrl: string): string {
  if (cached?.appUrl !== appUrl) cached = { appUrl, text: JSON.stringify(buildOpenApiDocument(appUrl)) };
  return cached.text;
}
