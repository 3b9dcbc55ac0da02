import { useState } from 'react';
import type { z } from 'zod';
import { saveFailure, serverFieldErrors, zodFieldErrors, type FieldErrors } from './form-errors';

/**
 * Validate with the shared schema, then send; field errors from either side land beside
 * their fields, anything else becomes one plain form message.
 */
export function useFormSubmit<S extends z.ZodType>(
  schema: S,
  send: (value: z.output<S>) => Promise<unknown>,
  /** A screen's own words for an error it understands better (e.g. 401 on sign-in = wrong password). */
  describe?: (error: unknown) => string | null,
) {
  const [errors, setErrors] = useState<FieldErrors>({});
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(input: unknown): Promise<boolean> {
    setMessage(null);
    const parsed = schema.safeParse(input);
    if (!parsed.success) {
      setErrors(zodFieldErrors(parsed.error));
      return false;
    }
    setErrors({});
    setBusy(true);
    try {
      await send(parsed.data);
      return true;
    } catch (e) {
      setErrors(serverFieldErrors(e));
      const { message } = saveFailure(e);
      setMessage(message === null ? null : (describe?.(e) ?? message));
      return false;
    } finally {
      setBusy(false);
    }
  }

  return { errors, message, busy, submit, setMessage };
}
