import type { UploadOptions } from '../../lib/schemas/upload-options';
import { type ApiResult, failureFrom, UNREACHABLE } from '../account/post-json';

/**
 * Sends the file and its options as multipart/form-data (what the upload endpoints read) and returns
 * the data or the error in the same shape as `requestJson`, never throwing.
 */
export async function sendUpload<T>(url: string, file: File, options: Partial<UploadOptions>): Promise<ApiResult<T>> {
  const form = new FormData();
  form.append('file', file, file.name);
  form.append('options', JSON.stringify(options));
  let response: Response;
  try {
    response = await fetch(url, {
      method: 'POST',
      body: form,
      credentials: 'same-origin',
      headers: { accept: 'application/json' },
    });
  } catch {
    return { ok: false, failure: UNREACHABLE };
  }
  let body: unknown = null;
  try {
    body = await response.json();
  } catch {
    body = null;
  }
  if (response.ok) return { ok: true, status: response.status, data: body as T };
  return { ok: false, failure: failureFrom(response.status, body) };
}
