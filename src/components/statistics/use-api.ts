import { useEffect, useState } from 'react';
import type { ErrorBody } from '../../lib/contracts/errors';

export type ApiState<T> = { status: 'loading' } | { status: 'ready'; data: T } | { status: 'failed'; message: string };

/** GET (or POST with a body) of one API answer; a newer request replaces an older one. Null url: nothing. */
export function useApi<T>(url: string | null, body?: unknown): ApiState<T> {
  const [state, setState] = useState<ApiState<T>>({ status: 'loading' });
  const bodyText = body === undefined ? undefined : JSON.stringify(body);
  useEffect(() => {
    if (url === null) return;
    const controller = new AbortController();
    setState({ status: 'loading' });
    fetch(url, {
      method: bodyText === undefined ? 'GET' : 'POST',
      headers: bodyText === undefined ? {} : { 'content-type': 'application/json' },
      body: bodyText,
      signal: controller.signal,
    })
      .then(async (response) => {
        const data = (await response.json()) as T | ErrorBody;
        if (!response.ok) {
          const message = (data as ErrorBody).error?.message ?? `The server answered ${response.status}.`;
          setState({ status: 'failed', message });
        } else setState({ status: 'ready', data: data as T });
      })
      .catch((error: unknown) => {
        if ((error as Error).name !== 'AbortError')
          setState({ status: 'failed', message: 'The statistics could not be loaded. Check the connection and try again.' });
      });
    return () => controller.abort();
  }, [url, bodyText]);
  return state;
}

/** Several GETs at once (e.g. one correlation per unit); ready when all have answered. */
export function useApiMany<T>(urls: string[]): ApiState<T[]> {
  const [state, setState] = useState<ApiState<T[]>>({ status: 'loading' });
  const key = urls.join('\n');
  useEffect(() => {
    if (key === '') return;
    const controller = new AbortController();
    setState({ status: 'loading' });
    Promise.all(
      key.split('\n').map(async (url) => {
        const response = await fetch(url, { signal: controller.signal });
        const data = (await response.json()) as T | ErrorBody;
        if (!response.ok) throw new Error((data as ErrorBody).error?.message ?? `The server answered ${response.status}.`);
        return data as T;
      }),
    )
      .then((data) => setState({ status: 'ready', data }))
      .catch((error: unknown) => {
        if ((error as Error).name !== 'AbortError') setState({ status: 'failed', message: (error as Error).message });
      });
    return () => controller.abort();
  }, [key]);
  return state;
}
