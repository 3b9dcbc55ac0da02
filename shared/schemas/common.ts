import { z } from 'zod';

export const uuid = z.uuid();
export const isoDateTime = z.string(); // ISO 8601 timestamps as JSON sends them
export const isoDate = z.iso.date(); // YYYY-MM-DD

type WithoutDefault<T> = T extends z.ZodDefault<infer Inner> ? Inner : T;

/**
 * The fields of a create schema without their defaults, for PATCH bodies: zod applies a
 * default even inside `.partial()`, which would reset every field the client did not send.
 */
export function withoutDefaults<S extends z.ZodRawShape>(
  shape: S,
): { [K in keyof S]: WithoutDefault<S[K]> } {
  return Object.fromEntries(
    Object.entries(shape).map(([k, v]) => [k, v instanceof z.ZodDefault ? v.unwrap() : v]),
  ) as { [K in keyof S]: WithoutDefault<S[K]> };
}

/** Every error the API returns has this shape (one error handler on the server). */
export const apiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
  }),
});
export type ApiError = z.infer<typeof apiErrorSchema>;

export const ERROR_CODES = {
  validation: 'validation_failed',
  unauthenticated: 'unauthenticated',
  forbidden: 'forbidden',
  notFound: 'not_found',
  conflict: 'conflict',
  staleVersion: 'stale_version',
  tooLarge: 'too_large',
  unsupportedMedia: 'unsupported_media_type',
  rateLimited: 'rate_limited',
  csrf: 'csrf_failed',
  internal: 'internal_error',
} as const;
