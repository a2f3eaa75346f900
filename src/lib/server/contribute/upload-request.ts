import { createHash } from 'node:crypto';
import type { UploadOptions } from '../../schemas/upload-options';

/** An upload as the services take it: the file's bytes, name, type and checksum, and the person's options. */
export interface UploadRequest {
  bytes: Uint8Array;
  fileName: string | null;
  mediaType: string;
  sha256: string;
  options: UploadOptions;
}

export function sha256Of(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}
