import type { ErrorBody, ErrorCode, FieldIssue } from '../../lib/contracts/errors';

export type { FieldIssue } from '../../lib/contracts/errors';

/** A refused request: the API's error body, or NETWORK when the server could not be reached. */
export interface ApiFailure {
  status: number;
  code: ErrorCode | 'NETWORK' | 'UNKNOWN';
  message: string;
  issues: FieldIssue[];
}

export type ApiResult<T> = { ok: true; status: number; data: T } | { ok: false; failure: ApiFailure };

export const UNREACHABLE: ApiFailure = {
  status: 0,
  code: 'NETWORK',
  message: 'Could not reach Claybank. Check your connection and try again.',
  issues: [],
};

/** The failure an answer describes; tolerant of bodies that are not in the error shape (a proxy's page). */
export function failureFrom(status: number, body: unknown): ApiFailure {
  const error = (body as Partial<ErrorBody> | null)?.error as Partial<ErrorBody['error']> | undefined;
  return {
    status,
    code: typeof error?.code === 'string' ? error.code : 'UNKNOWN',
    message:
      typeof error?.message === 'string'
        ? error.message
        : `The server refused the request (HTTP ${status}). Try again in a moment.`,
    issues: Array.isArray(error?.issues) ? error.issues : [],
  };
}

/** Calls one of Claybank's JSON endpoints on this origin and returns its data or its error, never throwing. */
export async function requestJson<T = unknown>(method: string, url: string, body?: unknown): Promise<ApiResult<T>> {
  let response: Response;
  try {
    response = await fetch(url, {
      method,
      credentials: 'same-origin',
      headers:
        body === undefined ? { accept: 'application/json' } : { accept: 'application/json', 'content-type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    return { ok: false, failure: UNREACHABLE };
  }
  const text = await response.text();
  let parsed: unknown = null;
  try {
    parsed = text ? JSON.parse(text) : null;
  } catch {
    parsed = null;
  }
  if (!response.ok) return { ok: false, failure: failureFrom(response.status, parsed) };
  return { ok: true, status: response.status, data: parsed as T };
}

export const getJson = <T>(url: string) => requestJson<T>('GET', url);
export const postJson = <T>(url: string, body: unknown = {}) => requestJson<T>('POST', url, body);
