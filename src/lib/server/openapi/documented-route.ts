import type { z } from 'zod';

/** Who may call a route, as the API page groups and labels them. */
export type Caller = 'anyone' | 'session' | 'apiKey';

export type RouteTag =
  | 'Partner uploads'
  | 'Account'
  | 'Firm'
  | 'Vocabulary'
  | 'Test records'
  | 'Submissions'
  | 'Review'
  | 'Estimates'
  | 'Statistics'
  | 'Admin'
  | 'Service';

/**
 * One endpoint as the OpenAPI description gives it: its request parts are the zod schemas the endpoint
 * itself parses with, so the description cannot drift from what is accepted.
 */
export interface DocumentedRoute {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  /** OpenAPI form: `/api/records/{id}` */
  path: string;
  tag: RouteTag;
  summary: string;
  /** who may call it, in words (roles) */
  who: string;
  caller: Caller;
  params?: Record<string, z.ZodType<string>>;
  query?: z.ZodObject;
  body?: { schema: z.ZodType; mediaType?: 'application/json' | 'multipart/form-data' | 'text/csv' }[];
  success: { status: 200 | 201 | 204; description: string };
}
