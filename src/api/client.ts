import type { z } from 'zod';
import { apiErrorSchema } from '@/shared/schemas';

/**
 * The one HTTP client. Same-origin on web (Express serves the app and /api), cookie session,
 * CSRF header on unsafe methods, responses parsed with the shared zod schemas.
 */
let csrfToken: string | null = null;
export function setCsrfToken(token: string | null) {
  csrfToken = token;
}

export const API_BASE = process.env.EXPO_PUBLIC_API_BASE ?? '';

export class ApiRequestError extends Error {
  constructor(
    public status: number,
    public code: string,
    message: string,
    public fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'ApiRequestError';
  }
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export async function request<T>(
  method: Method,
  path: string,
  options: { body?: unknown; form?: FormData; schema?: z.ZodType<T>; signal?: AbortSignal } = {},
): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (method !== 'GET' && csrfToken) headers['x-csrf-token'] = csrfToken;
  let body: BodyInit | undefined;
  if (options.form) body = options.form;
  else if (options.body !== undefined) {
    headers['Content-Type'] = 'application/json';
    body = JSON.stringify(options.body);
  }
  let res: Response;
  try {
    res = await fetch(`${API_BASE}${path}`, {
      method,
      headers,
      body,
      credentials: 'include',
      signal: options.signal,
    });
  } catch {
    throw new ApiRequestError(
      0,
      'network',
      'Cannot reach the Soundframe server. Check your connection and try again.',
    );
  }
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  const json = text ? safeJson(text) : undefined;
  if (!res.ok) {
    const parsed = apiErrorSchema.safeParse(json);
    if (parsed.success) {
      const e = parsed.data.error;
      throw new ApiRequestError(res.status, e.code, e.message, e.fields);
    }
    throw new ApiRequestError(
      res.status,
      'http_' + res.status,
      `The server answered ${res.status}.`,
    );
  }
  return options.schema ? options.schema.parse(json) : (json as T);
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/** Plain words for any error a query or mutation can raise. */
export function cleanError(error: unknown): string {
  if (error instanceof ApiRequestError) {
    if (error.status === 0) return error.message;
    if (error.status === 401) return 'Your session has ended. Please sign in again.';
    if (error.status === 403) return 'Your role in this workshop does not allow that.';
    if (error.status === 404) return 'That record was not found. It may have been removed.';
    if (error.status === 409 && error.code === 'stale_version')
      return 'Someone else changed this record while you were editing. Reload to see their changes, then edit again.';
    if (error.status === 429) return 'Too many attempts. Wait a minute and try again.';
    if (error.status >= 500) return 'Something went wrong on the server. Try again in a moment.';
    return error.message;
  }
  if (error instanceof Error && error.name === 'ZodError')
    return 'The server sent an answer this version of the app does not understand. Reload the page.';
  return 'Something went wrong. Try again.';
}
