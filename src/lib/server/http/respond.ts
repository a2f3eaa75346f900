import type { APIContext, APIRoute } from 'astro';
import type { z } from 'zod';
import type { AppServices } from '../app-services';
import { ApiError, ERROR_STATUS, type ErrorBody, type ErrorCode, type FieldIssue } from './api-error';
import { toHttpError } from './error-mapper';

const NO_STORE = { 'cache-control': 'no-store' };

export function json(data: unknown, status = 200, headers: Record<string, string> = {}): Response {
  return new Response(JSON.stringify(data), {
    status,
    headers: { 'content-type': 'application/json; charset=utf-8', ...NO_STORE, ...headers },
  });
}

/** A 200 answer whose body is already JSON text (e.g. serialised in a worker thread). */
export function jsonText(text: string, status = 200): Response {
  return new Response(text, { status, headers: { 'content-type': 'application/json; charset=utf-8', ...NO_STORE } });
}

export function errorResponse(
  code: ErrorCode,
  message: string,
  issues?: FieldIssue[],
  headers: Record<string, string> = {},
): Response {
  const body: ErrorBody = { error: { code, message, ...(issues?.length ? { issues } : {}) } };
  return json(body, ERROR_STATUS[code], headers);
}

/** zod issues as dotted field paths with their messages. */
export function issuesFromZod(error: z.ZodError): FieldIssue[] {
  return error.issues.map((issue) => ({ path: issue.path.map(String).join('.'), message: issue.message }));
}

/** An endpoint's body: the request context and the process-wide services (`context.locals.app`). */
export type ApiHandler = (context: APIContext, app: AppServices) => Promise<Response> | Response;

/**
 * Wraps an endpoint so every failure leaves in the one error shape: edge and domain errors with the
 * code `toHttpError` gives them, anything unexpected as a 500 that names no internals (the detail
 * goes to the server log).
 */
export function handleApi(handler: ApiHandler): APIRoute {
  return async (context) => {
    try {
      return await handler(context, context.locals.app);
    } catch (error) {
      const known = toHttpError(error);
      if (known) return errorResponse(known.code, known.message, known.issues, known.headers);
      console.error(`[api] ${context.request.method} ${context.url.pathname} failed:`, error);
      return errorResponse(
        'INTERNAL',
        'Something went wrong on the server. Try again; if it keeps happening, tell the platform admin the time it happened.',
      );
    }
  };
}

/** A body that fits the schema, or ApiError (400) with one issue per field. */
function validBody<T extends z.ZodType>(schema: T, raw: unknown): z.infer<T> {
  const parsed = schema.safeParse(raw);
  if (!parsed.success) {
    throw new ApiError(
      'VALIDATION_FAILED',
      'Some fields are missing or invalid; see issues for each field.',
      issuesFromZod(parsed.error),
    );
  }
  return parsed.data;
}

/** Reads a JSON body and validates it; throws ApiError (400) with per-field issues when it does not fit. */
export async function readJsonBody<T extends z.ZodType>(request: Request, schema: T): Promise<z.infer<T>> {
  const type = request.headers.get('content-type') ?? '';
  if (!type.toLowerCase().includes('application/json')) {
    throw new ApiError('UNSUPPORTED_MEDIA_TYPE', 'Send the body as JSON with the header Content-Type: application/json.');
  }
  let raw: unknown;
  try {
    raw = await request.json();
  } catch {
    throw new ApiError('BAD_REQUEST', 'The request body is not valid JSON. Check for a missing comma, quote or bracket.');
  }
  return validBody(schema, raw);
}

/**
 * Reads a form post (urlencoded or multipart, text fields only) and validates it like a JSON body;
 * throws ApiError (400) with per-field issues when it does not fit.
 */
export async function readFormBody<T extends z.ZodType>(request: Request, schema: T): Promise<z.infer<T>> {
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    throw new ApiError('BAD_REQUEST', 'The form could not be read. Send it as application/x-www-form-urlencoded.');
  }
  const fields: Record<string, string> = {};
  for (const [name, value] of form) {
    if (typeof value !== 'string') throw new ApiError('BAD_REQUEST', `The form field "${name}" must be text, not a file.`);
    fields[name] = value;
  }
  return validBody(schema, fields);
}

/** Validates a URL's query string; throws ApiError (400) with per-parameter issues. */
export function readQuery<T extends z.ZodType>(url: URL, schema: T): z.infer<T> {
  const parsed = schema.safeParse(Object.fromEntries(url.searchParams));
  if (!parsed.success) {
    throw new ApiError('VALIDATION_FAILED', 'Some query parameters are invalid; see issues.', issuesFromZod(parsed.error));
  }
  return parsed.data;
}
