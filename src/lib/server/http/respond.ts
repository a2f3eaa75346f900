import type { APIContext, APIRoute } from 'astro';
import type { z } from 'zod';
import type { AppServices } from '../app-services';
import { ApiError, ERROR_STATUS, type ErrorBody, type ErrorCode, type FieldIssue } from './api-error';
import { toHttpError } from './error-mapper';
import { unstorableTextIssues } from './json-safety';
import { BODY_LIMIT_BYTES, parseJsonBytes, readBodyBytes, readJsonValue } from './read-body';

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

/**
 * Reads a JSON body within `limitBytes` (413 above it; see read-body.ts for the other refusals) and
 * validates it; throws ApiError (400) with per-field issues when it does not fit.
 */
export async function readJsonBody<T extends z.ZodType>(
  request: Request,
  schema: T,
  limitBytes: number = BODY_LIMIT_BYTES.form,
): Promise<z.infer<T>> {
  return validBody(schema, await readJsonValue(request, limitBytes));
}

/**
 * A JSON body already read with `readBodyBytes` (for a route that also keeps the bytes, e.g. to hash
 * them), checked and validated exactly as readJsonBody does.
 */
export function parseJsonBody<T extends z.ZodType>(bytes: Uint8Array, schema: T): z.infer<T> {
  return validBody(schema, parseJsonBytes(bytes));
}

/**
 * Reads a urlencoded form post (text fields only) within `limitBytes` and validates it like a JSON
 * body: 413 above the limit, 400 naming the field for a repeated field, a file, or text that cannot
 * be stored (NUL, unpaired surrogates), and per-field issues when it does not fit the schema.
 */
export async function readFormBody<T extends z.ZodType>(
  request: Request,
  schema: T,
  limitBytes: number = BODY_LIMIT_BYTES.form,
): Promise<z.infer<T>> {
  const contentType = request.headers.get('content-type') ?? '';
  const bytes = await readBodyBytes(request, limitBytes);
  let form: FormData;
  try {
    form = await new Response(bytes, { headers: { 'content-type': contentType } }).formData();
  } catch {
    throw new ApiError('BAD_REQUEST', 'The form could not be read. Send it as application/x-www-form-urlencoded.');
  }
  const entries = new Map<string, string>();
  for (const [name, value] of form) {
    if (typeof value !== 'string') throw new ApiError('BAD_REQUEST', `The form field "${name}" must be text, not a file.`);
    if (entries.has(name)) {
      throw new ApiError('VALIDATION_FAILED', 'A form field is sent more than once; see issues.', [
        { path: name, message: `Send "${name}" once.` },
      ]);
    }
    entries.set(name, value);
  }
  const fields = Object.fromEntries(entries);
  const issues = unstorableTextIssues(fields);
  if (issues.length > 0) {
    throw new ApiError('VALIDATION_FAILED', 'Some text in the form cannot be stored; see issues for each field.', issues);
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
