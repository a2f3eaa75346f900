import type { APIContext, APIRoute } from 'astro';
import type { z } from 'zod';
import { ApiError, ERROR_STATUS, type ErrorBody, type ErrorCode, type FieldIssue } from './api-error';
import { BODY_LIMIT_BYTES, readJsonValue } from './read-body';

const NO_STORE = { 'cache-control': 'no-store' };

export function json(data: unknown, status = 200, headers: Record<string, string> = {}): Response {
  return new Response(JSON.stringify(data), {
    status,
    headers: { 'content-type': 'application/json; charset=utf-8', ...NO_STORE, ...headers },
  });
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

/**
 * Wraps an endpoint so every failure leaves in the one error shape: ApiError with its own code,
 * anything unexpected as a 500 that names no internals (the detail goes to the server log).
 */
export function handleApi(handler: (context: APIContext) => Promise<Response> | Response): APIRoute {
  return async (context) => {
    try {
      return await handler(context);
    } catch (error) {
      if (error instanceof ApiError) return errorResponse(error.code, error.message, error.issues, error.headers);
      console.error(`[api] ${context.request.method} ${context.url.pathname} failed:`, error);
      return errorResponse(
        'INTERNAL',
        'Something went wrong on the server. Try again; if it keeps happening, tell the platform admin the time it happened.',
      );
    }
  };
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
  const raw = await readJsonValue(request, limitBytes);
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

/** Validates a URL's query string; throws ApiError (400) with per-parameter issues. */
export function readQuery<T extends z.ZodType>(url: URL, schema: T): z.infer<T> {
  const parsed = schema.safeParse(Object.fromEntries(url.searchParams));
  if (!parsed.success) {
    throw new ApiError('VALIDATION_FAILED', 'Some query parameters are invalid; see issues.', issuesFromZod(parsed.error));
  }
  return parsed.data;
}
