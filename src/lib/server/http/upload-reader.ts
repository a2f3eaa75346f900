import { MAX_FILE_BYTES } from '../../import';
import { uploadOptionsSchema } from '../../schemas/upload-options';
import { sha256Of, type UploadRequest } from '../contribute/upload-request';
import { ApiError } from './api-error';
import { parseJsonText, readBodyBytes, requireStorableText } from './read-body';
import { issuesFromZod } from './respond';

/** Room for the form's other fields and boundaries around the file itself. */
const MULTIPART_OVERHEAD_BYTES = 1024 * 1024;
const UPLOAD_FORM_FIELDS = new Set(['file', 'options']);

/** The most an upload request may weigh: one file at the limit and the form around it. */
export const MAX_UPLOAD_BYTES = MAX_FILE_BYTES + MULTIPART_OVERHEAD_BYTES;

/** 413 before reading a body that is announced as too large. */
export function refuseOversizedBody(request: Request, limitBytes = MAX_UPLOAD_BYTES): void {
  const length = Number(request.headers.get('content-length') ?? '0');
  if (length > limitBytes) {
    throw new ApiError(
      'PAYLOAD_TOO_LARGE',
      `The upload is ${(length / 1048576).toFixed(1)} MB; the limit is ${MAX_FILE_BYTES / 1048576} MB per file. Split the file.`,
    );
  }
}

function refuseUnknownFields(form: FormData): void {
  const unknownFields = [...new Set(form.keys())].filter((name) => !UPLOAD_FORM_FIELDS.has(name));
  if (unknownFields.length === 0) return;
  throw new ApiError(
    'VALIDATION_FAILED',
    'The upload form has fields it does not use; see issues.',
    unknownFields.map((name) => ({
      path: name,
      message: `"${name}" is not part of an upload. Send only "file" and "options".`,
    })),
  );
}

function readOptions(form: FormData) {
  let rawOptions: unknown = {};
  const optionsText = form.get('options');
  if (typeof optionsText === 'string' && optionsText.trim() !== '') {
    try {
      rawOptions = parseJsonText(optionsText);
    } catch (error) {
      if (!(error instanceof ApiError)) throw error;
      const issues = error.issues?.map((i) => ({ ...i, path: `options.${i.path}` })) ?? [
        { path: 'options', message: error.message },
      ];
      throw new ApiError(error.code, 'The upload options cannot be used; see issues.', issues);
    }
  }
  const parsed = uploadOptionsSchema.safeParse(rawOptions);
  if (!parsed.success)
    throw new ApiError(
      'VALIDATION_FAILED',
      'Some upload options are invalid; see issues.',
      issuesFromZod(parsed.error).map((i) => ({ ...i, path: `options.${i.path}` })),
    );
  return parsed.data;
}

/**
 * Reads a multipart upload within MAX_UPLOAD_BYTES (counted on the stream, not only the announced
 * length): the form field `file` and the JSON form field `options`, and nothing else.
 */
export async function readUploadRequest(request: Request): Promise<UploadRequest> {
  const contentType = request.headers.get('content-type') ?? '';
  if (!contentType.includes('multipart/form-data')) {
    throw new ApiError(
      'UNSUPPORTED_MEDIA_TYPE',
      'Send the file as multipart/form-data with a field named "file" (and "options" as JSON).',
    );
  }
  refuseOversizedBody(request);
  const body = await readBodyBytes(request, MAX_UPLOAD_BYTES);
  let form: FormData;
  try {
    form = await new Response(body, { headers: { 'content-type': contentType } }).formData();
  } catch {
    throw new ApiError('BAD_REQUEST', 'The upload could not be read as a form. Send multipart/form-data with a "file" field.');
  }
  refuseUnknownFields(form);
  const file = form.get('file');
  if (!(file instanceof File))
    throw new ApiError('VALIDATION_FAILED', 'Choose a file to upload.', [{ path: 'file', message: 'Choose a file to upload.' }]);
  if (file.size > MAX_FILE_BYTES) {
    throw new ApiError(
      'PAYLOAD_TOO_LARGE',
      `The file is ${(file.size / 1048576).toFixed(1)} MB; the limit is ${MAX_FILE_BYTES / 1048576} MB. Split it into smaller files.`,
    );
  }
  const options = readOptions(form);
  const bytes = new Uint8Array(await file.arrayBuffer());
  return {
    bytes,
    fileName: requireStorableText(file.name || null, 'file'),
    mediaType: file.type || 'application/octet-stream',
    sha256: sha256Of(bytes),
    options,
  };
}
