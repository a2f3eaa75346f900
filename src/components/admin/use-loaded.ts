import { useCallback, useEffect, useState } from 'react';
import { getJson } from '../account/post-json';

export type Loaded<T> = { kind: 'loading' } | { kind: 'failed'; message: string } | { kind: 'loaded'; data: T };

/** Loads one API answer on mount and again on `reload()`; `url` changes load it anew. */
export function useLoaded<T>(url: string) {
  const [state, setState] = useState<Loaded<T>>({ kind: 'loading' });
  const reload = useCallback(async () => {
    const result = await getJson<T>(url);
    setState(result.ok ? { kind: 'loaded', data: result.data } : { kind: 'failed', message: result.failure.message });
  }, [url]);
  useEffect(() => {
    void reload();
  }, [reload]);
  return { state, reload };
}
