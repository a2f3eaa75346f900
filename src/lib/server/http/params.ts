import type { APIContext } from 'astro';
import { z } from 'zod';
import { ApiError } from './api-error';

/** A uuid in the address: submissions, records, regions, geological units. */
export const uuidParam = z.uuid();

/** An id better-auth made (32 letters and digits): firms, members, invitations, API keys. */
export const authIdParam = z.string().regex(/^[A-Za-z0-9]{1,64}$/);

/**
 * Reads the path parameters with one zod schema per parameter. A parameter that does not fit (not a
 * uuid, empty, a NUL, 10 kB of text) answers 404 in the error shape: no such thing can exist there.
 */
export function readParams<S extends Record<string, z.ZodType<string>>>(
  context: Pick<APIContext, 'params'>,
  shape: S,
): { [K in keyof S]: z.infer<S[K]> } {
  const parsed = z.object(shape).safeParse(context.params);
  if (!parsed.success) {
    const name = String(parsed.error.issues[0]?.path[0] ?? 'id');
    throw new ApiError(
      'NOT_FOUND',
      `There is nothing at this address: its ${name} is not a valid id. Check the link, or copy the id again from the list it came from.`,
    );
  }
  return parsed.data as { [K in keyof S]: z.infer<S[K]> };
}
