import type { UploadOptions } from '../../lib/schemas/upload-options';
import type { ApiFailure, ApiResult } from '../account/post-json';

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
    return {
      ok: false,
      failure: {
        status: 0,
        code: 'NETWORK',
        message: 'Could not reach Claybank. Check your connection and try again.',
        issues: [],
      },
    };
  }
  let body: unknown = null;
  try {
    body = await response.json();
  } catch {
    body = null;
  }
  if (response.ok) return { ok: true, status: response.status, data: body as T };
  const error = (body as { error?: Partial<ApiFailure> } | null)?.error;
  return {
    ok: false,
    failure: {
      status: response.status,
      code: typeof error?.code === 'string' ? error.code : 'UNKNOWN',
      message:
        typeof error?.message === 'string' ? error.message : `The upload was refused (HTTP ${response.status}). Try again.`,
      issues: Array.isArray(error?.issues) ? error.issues : [],
    },
  };
}
