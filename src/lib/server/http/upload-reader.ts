import { MAX_FILE_BYTES } from '../../import';
import { uploadOptionsSchema } from '../../schemas/upload-options';
import { sha256Of, type UploadRequest } from '../contribute/upload-request';
import { ApiError } from './api-error';
import { issuesFromZod } from './respond';

/** Room for the form's other fields and boundaries around the file itself. */
const MULTIPART_OVERHEAD_BYTES = 1024 * 1024;

/** 413 before reading a body that is announced as too large. */
export function refuseOversizedBody(request: Request, limitBytes = MAX_FILE_BYTES + MULTIPART_OVERHEAD_BYTES): void {
  const length = Number(request.headers.get('content-length') ?? '0');
  if (length > limitBytes) {
    throw new ApiError(
      'PAYLOAD_TOO_LARGE',
      `The upload is ${(length / 1048576).toFixed(1)} MB; the limit is ${MAX_FILE_BYTES / 1048576} MB per file. Split the file.`,
    );
  }
}

function readOptions(form: FormData) {
  let rawOptions: unknown = {};
  const optionsText = form.get('options');
  if (typeof optionsText === 'string' && optionsText.trim() !== '') {
    try {
      rawOptions = JSON.parse(optionsText);
    } catch {
      throw new ApiError('VALIDATION_FAILED', 'The upload options are not valid JSON.', [
        { path: 'options', message: 'Send the options as a JSON object.' },
      ]);
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

/** Reads a multipart upload: the form field `file` and the JSON form field `options`. */
export async function readUploadRequest(request: Request): Promise<UploadRequest> {
  if (!(request.headers.get('content-type') ?? '').includes('multipart/form-data')) {
    throw new ApiError(
      'UNSUPPORTED_MEDIA_TYPE',
      'Send the file as multipart/form-data with a field named "file" (and "options" as JSON).',
    );
  }
  refuseOversizedBody(request);
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    throw new ApiError('BAD_REQUEST', 'The upload could not be read as a form. Send multipart/form-data with a "file" field.');
  }
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
    fileName: file.name || null,
    mediaType: file.type || 'application/octet-stream',
    sha256: sha256Of(bytes),
    options,
  };
}
