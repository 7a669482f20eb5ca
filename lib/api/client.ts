import { env } from '@/lib/env';

import type { ErrorBody } from './types';

/** An API failure, with the server's code, message and per-field messages. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

const NETWORK_MESSAGE = 'Cannot reach the Fizzwright server. Check your connection and try again.';

/**
 * Calls the API. The session travels in an httpOnly cookie (`credentials: 'include'`), so scripts never hold it.
 * Resolves with the parsed JSON (undefined for 204) or throws an ApiError.
 */
export async function apiRequest<T>(
  path: string,
  options: { method?: Method; body?: unknown; signal?: AbortSignal } = {},
): Promise<T> {
  const { method = 'GET', body, signal } = options;
  let response: Response;
  try {
    response = await fetch(`${env.apiUrl}/api${path}`, {
      method,
      credentials: 'include',
      headers:
        body === undefined
          ? { Accept: 'application/json' }
          : { Accept: 'application/json', 'Content-Type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
      signal,
    });
  } catch (error) {
    if ((error as Error).name === 'AbortError') throw error;
    throw new ApiError(0, 'network', NETWORK_MESSAGE);
  }
  return readResponse<T>(response);
}

/** The body of an answer, or the ApiError its uniform error body describes. */
async function readResponse<T>(response: Response): Promise<T> {
  if (response.status === 204) return undefined as T;
  const text = await response.text();
  let parsed: unknown;
  try {
    parsed = text ? JSON.parse(text) : undefined;
  } catch {
    parsed = undefined;
  }
  if (!response.ok) {
    const error = (parsed as ErrorBody | undefined)?.error;
    throw new ApiError(
      response.status,
      error?.code ?? 'http_error',
      error?.message ?? `The server answered ${response.status}.`,
      error?.fields,
    );
  }
  return parsed as T;
}

/** Sends one file as multipart form data (the browser sets the boundary). */
async function upload<T>(path: string, file: Blob, name: string): Promise<T> {
  const form = new FormData();
  form.append('file', file, name);
  let response: Response;
  try {
    response = await fetch(`${env.apiUrl}/api${path}`, {
      method: 'POST',
      credentials: 'include',
      body: form,
      headers: { Accept: 'application/json' },
    });
  } catch {
    throw new ApiError(0, 'network', NETWORK_MESSAGE);
  }
  return readResponse<T>(response);
}

export const api = {
  upload,
  get: <T>(path: string, signal?: AbortSignal) => apiRequest<T>(path, { signal }),
  post: <T>(path: string, body?: unknown) => apiRequest<T>(path, { method: 'POST', body: body ?? {} }),
  patch: <T>(path: string, body: unknown) => apiRequest<T>(path, { method: 'PATCH', body }),
  put: <T>(path: string, body: unknown) => apiRequest<T>(path, { method: 'PUT', body }),
  // The server takes only JSON bodies on requests that change something, an empty one included.
  delete: <T>(path: string) => apiRequest<T>(path, { method: 'DELETE', body: {} }),
};
