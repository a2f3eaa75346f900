import type { ErrorCode } from './api-error';
import { errorResponse, json } from './respond';

const STATUS_TO_CODE: Record<number, ErrorCode> = {
  400: 'BAD_REQUEST',
  401: 'UNAUTHENTICATED',
  403: 'FORBIDDEN',
  404: 'NOT_FOUND',
  405: 'METHOD_NOT_ALLOWED',
  409: 'CONFLICT',
  413: 'PAYLOAD_TOO_LARGE',
  415: 'UNSUPPORTED_MEDIA_TYPE',
  422: 'UNPROCESSABLE',
  429: 'RATE_LIMITED',
};

/** Plain wording for the library's error codes that its exposed routes can give. */
const MESSAGES: Record<string, string> = {
  INVALID_TOKEN: 'This link is not valid or has already been used. Ask for a new one.',
  TOKEN_EXPIRED: 'This link has expired. Ask for a new one.',
  USER_NOT_FOUND: 'This link is not valid or has already been used. Ask for a new one.',
  INVALID_USER: 'This link belongs to another account. Sign out and open it again.',
};

/** Headers worth keeping from the library's answer (cookies it sets, redirects, retry hints). */
const KEPT_HEADERS = ['set-cookie', 'location', 'retry-after', 'x-retry-after'];

/** Removes every `token` field, so a session token never travels in a JSON body. */
function withoutTokens(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(withoutTokens);
  if (value === null || typeof value !== 'object') return value;
  return Object.fromEntries(
    Object.entries(value)
      .filter(([key]) => key !== 'token')
      .map(([key, inner]) => [key, withoutTokens(inner)]),
  );
}

function keptHeaders(from: Headers, to: Headers): void {
  for (const cookie of from.getSetCookie()) to.append('set-cookie', cookie);
  for (const name of KEPT_HEADERS.slice(1)) {
    const value = from.get(name);
    if (value !== null) to.set(name, value);
  }
}

/** The body as JSON, or null when it is empty or not JSON (the library sends redirects with a JSON type and no body). */
async function jsonOf(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text.trim() === '') return null;
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}

/**
 * The library's answer in our terms: errors in the one error shape with plain messages, JSON without
 * session tokens, redirects and cookies as they are.
 */
export async function libraryAnswer(response: Response): Promise<Response> {
  if (response.status >= 300 && response.status < 400) return response;
  const isJson = (response.headers.get('content-type') ?? '').includes('application/json');
  let answer: Response;
  if (response.status >= 400) {
    const body = (isJson ? await jsonOf(response) : null) as { code?: unknown } | null;
    const libraryCode = typeof body?.code === 'string' ? body.code : '';
    const code = STATUS_TO_CODE[response.status] ?? (response.status >= 500 ? 'INTERNAL' : 'BAD_REQUEST');
    const message =
      MESSAGES[libraryCode] ??
      (code === 'INTERNAL'
        ? 'Something went wrong on the server. Try again; if it keeps happening, tell the platform admin the time it happened.'
        : code === 'RATE_LIMITED'
          ? 'Too many attempts. Wait a minute and try again.'
          : 'The request was refused.');
    answer = errorResponse(code, message);
  } else if (isJson) {
    answer = json(withoutTokens(await jsonOf(response)), response.status);
  } else {
    return response;
  }
  keptHeaders(response.headers, answer.headers);
  return answer;
}
