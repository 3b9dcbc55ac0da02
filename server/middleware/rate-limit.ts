import type { Request } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { ERROR_CODES } from '@/shared/schemas/common';
import { depsOf } from '../app';
import { AppError } from '../errors';

const WINDOW_MS = 15 * 60_000;

/**
 * Sign-in attempts per IP and e-mail address in a 15-minute window (`SIGN_IN_RATE_LIMIT`).
 * Successful sign-ins do not count, so a person who types their password right is never
 * locked out by their own earlier visits; guessing is what runs into the limit.
 * Runs after validation, so the e-mail is already lower-cased. One store per app.
 */
export function signInRateLimit() {
  return rateLimit({
    windowMs: WINDOW_MS,
    limit: (req: Request) => depsOf(req).config.signInRateLimit,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req: Request) =>
      `${ipKeyGenerator(req.ip ?? '')}|${String(req.body?.email ?? '')}`,
    handler: (_req, _res, next) =>
      next(
        new AppError(
          429,
          ERROR_CODES.rateLimited,
          'Too many sign-in attempts for this address. Wait 15 minutes and try again.',
        ),
      ),
  });
}
