import { type SyntheticEvent, useState } from 'react';
import type { z } from 'zod';
import { type FieldErrors, fieldErrorsFromServer, fieldErrorsFromZod } from './field-errors';
import type { ApiResult } from './post-json';

/**
 * State of a small form checked by a shared zod schema before it is sent: field values, a message
 * beside each field, one message for the whole form, and whether a request is under way.
 */
export function useSchemaForm<K extends string, Out>(schema: z.ZodType<Out>, initial: Record<K, string>) {
  const [values, setValues] = useState(initial);
  const [fieldErrors, setFieldErrors] = useState<FieldErrors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const setValue = (field: K, value: string) => {
    setValues((current) => ({ ...current, [field]: value }));
    setFieldErrors((current) => ({ ...current, [field]: undefined }));
  };

  /** Validates, sends, and returns the server's data, or null after showing what went wrong. */
  async function submit<R>(event: SyntheticEvent, send: (input: Out) => Promise<ApiResult<R>>): Promise<R | null> {
    event.preventDefault();
    setFormError(null);
    const parsed = schema.safeParse(values);
    if (!parsed.success) {
      setFieldErrors(fieldErrorsFromZod(parsed.error.issues));
      return null;
    }
    setFieldErrors({});
    setBusy(true);
    try {
      const result = await send(parsed.data);
      if (result.ok) return result.data;
      setFieldErrors(fieldErrorsFromServer(result.failure.issues));
      setFormError(result.failure.message);
      return null;
    } finally {
      setBusy(false);
    }
  }

  return { values, setValue, setValues, fieldErrors, formError, setFormError, busy, submit };
}
