// The served OpenAPI description lists exactly the API the app serves: every documented operation is a
// route in the inventory read from src/pages, and every API route is documented, apart from the few
// named below with their reason. source: OpenAPI Specification 3.0.3 §4.7 (Paths, Operation objects).
import { afterAll, describe, expect, it } from 'vitest';
import { routeInventory } from './support/route-inventory';
import { call, db } from './support/world';

/** Routes the description leaves out on purpose. */
const UNDOCUMENTED: Record<string, string> = {
  'ALL /api/*path': 'the catch-all that answers 404 for unknown paths',
  'ALL /api/auth/*all': "the sign-in library's own routes, closed but for its two mail links",
  'GET /api/auth/verify-email': 'a link in the confirmation mail, opened in a browser',
  'GET /api/auth/reset-password/:token': 'a link in the password-reset mail, opened in a browser',
  'GET /api/dev/inbox': 'the development inbox, served only in development mode',
};

type Document = {
  openapi: string;
  paths: Record<string, Record<string, { requestBody?: unknown; parameters?: { name: string; in: string }[] }>>;
  components: { schemas: Record<string, unknown> };
};

afterAll(async () => {
  await db.destroy();
});

describe('GET /api/openapi.json', () => {
  it('documents every API route the app serves, and nothing it does not', async () => {
    const answer = await call('GET', '/api/openapi.json', null);
    expect(answer.status).toBe(200);
    const doc = answer.body as Document;
    expect(doc.openapi).toBe('3.0.3');
    const documented = Object.entries(doc.paths)
      .flatMap(([path, operations]) =>
        Object.keys(operations).map((method) => `${method.toUpperCase()} ${path.replace(/\{(\w+)\}/g, ':$1')}`),
      )
      .sort();
    const served = routeInventory()
      .filter((route) => !route.startsWith('PAGE ') && !(route in UNDOCUMENTED))
      .sort();
    expect(documented).toEqual(served);
  });

  it('describes request bodies and path ids from the endpoints’ own schemas', async () => {
    const doc = (await call('GET', '/api/openapi.json', null)).body as Document;
    const merge = doc.paths['/api/vocabulary/units/{id}/merge']?.post;
    expect(merge?.parameters).toEqual([expect.objectContaining({ name: 'id', in: 'path' })]);
    expect(JSON.stringify(merge?.requestBody)).toContain('intoUnitId');
    const partner = doc.paths['/api/partner/submissions']?.post?.requestBody as { content: Record<string, unknown> };
    expect(Object.keys(partner.content).sort()).toEqual(['application/json', 'text/csv']);
    expect(JSON.stringify(doc.paths['/api/estimates/preview']?.post?.requestBody)).toContain('waterTableDepth');
    expect(Object.keys(doc.components.schemas)).toEqual(expect.arrayContaining(['ErrorBody', 'UploadOptions']));
  });

  it('gives every field of every request body a type (none is left as an empty schema)', async () => {
    const doc = (await call('GET', '/api/openapi.json', null)).body as Document;
    const empty: string[] = [];
    const walk = (node: unknown, at: string) => {
      if (!node || typeof node !== 'object') return;
      if (!Array.isArray(node) && Object.keys(node).length === 0) empty.push(at);
      for (const [key, child] of Object.entries(node)) walk(child, `${at}.${key}`);
    };
    for (const [path, operations] of Object.entries(doc.paths)) {
      for (const [method, operation] of Object.entries(operations)) walk(operation.requestBody, `${method} ${path}`);
    }
    expect(empty).toEqual([]);
  });
});
