import type { z } from 'zod';
import { ApiRequestError } from '@/src/api/client';

export type FieldErrors = Record<string, string>;

/** First message per top-level field of a failed client-side parse (same schema as the server). */
export function zodFieldErrors(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = String(issue.path[0] ?? 'form');
    if (!out[key]) out[key] = issue.message;
  }
  return out;
}

/** The server's `error.fields` (400 validation), keyed the same way; empty for other errors. */
export function serverFieldErrors(error: unknown): FieldErrors {
  if (!(error instanceof ApiRequestError) || !error.fields) return {};
  const out: FieldErrors = {};
  for (const [path, message] of Object.entries(error.fields)) {
    const key = path.split('.')[0];
    if (!out[key]) out[key] = message;
  }
  return out;
}
