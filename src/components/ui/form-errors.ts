import type { z } from 'zod';
import { ApiRequestError, cleanError } from '@/src/api/client';

export type FieldErrors = Record<string, string>;

/** What the toast says when the server's field errors are shown beside their fields. */
export const FIELDS_NEED_ATTENTION = 'Some fields need attention. See the messages beside them.';

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

export type SaveFailure = {
  /** Someone else saved first (409): forms of versioned records offer a reload instead. */
  conflict: boolean;
  /** The server's field errors by full path (`moisture.meterReading`); empty for other failures. */
  fields: FieldErrors;
  /** One plain message, or null when the field errors say it all (a 400 with fields). */
  message: string | null;
};

/** A failed save, sorted the same way by every form. */
export function saveFailure(error: unknown): SaveFailure {
  const api = error instanceof ApiRequestError ? error : undefined;
  const fields = api?.fields ?? {};
  const onlyFields = api?.status === 400 && Object.keys(fields).length > 0;
  return { conflict: api?.status === 409, fields, message: onlyFields ? null : cleanError(error) };
}
