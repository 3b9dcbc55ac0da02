import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { ERROR_CODES } from '@/shared/schemas/common';
import { depsOf } from '../app';
import { AppError } from '../errors';

const WINDOW_MS = 15 * 60_000;

/** Requests per key in a 15-minute window; over the limit, a 429 with `message`. One store per call. */
function limiter(opts: {
  limit: (req: Request) => number;
  key: (req: Request) => string;
  message: string;
  skipSuccessfulRequests?: boolean;
}): RequestHandler {
  return rateLimit({
    windowMs: WINDOW_MS,
    limit: opts.limit,
    skipSuccessfulRequests: opts.skipSuccessfulRequests ?? false,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: opts.key,
    handler: (_req, _res, next) => next(new AppError(429, ERROR_CODES.rateLimited, opts.message)),
  });
}

/**
 * Sign-in attempts per IP and e-mail address in a 15-minute window (`SIGN_IN_RATE_LIMIT`).
 * Successful sign-ins do not count, so a person who types their password right is never
 * locked out by their own earlier visits; guessing is what runs into the limit.
 * Runs after validation, so the e-mail is already lower-cased. One store per app.
 */
export const signInRateLimit = () =>
  limiter({
    limit: (req) => depsOf(req).config.signInRateLimit,
    skipSuccessfulRequests: true,
    key: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String(req.body?.email ?? '')}`,
    message: 'Too many sign-in attempts for this address. Wait 15 minutes and try again.',
  });

/** Per IP, `PUBLIC_RATE_LIMIT` requests in 15 minutes: links and identifiers cannot be guessed at speed. */
export const publicRateLimit = () =>
  limiter({
    limit: (req) => depsOf(req).config.publicRateLimit,
    key: (req) => ipKeyGenerator(req.ip ?? ''),
    message: 'Too many requests from this address. Wait 15 minutes and try again.',
  });
