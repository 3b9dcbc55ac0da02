import crypto from 'node:crypto';
import type { NextFunction, Request, Response } from 'express';
import jwt from 'jsonwebtoken';
import { ERROR_CODES } from '@/shared/schemas/common';
import type { Config } from '../config';
import { AppError, unauthenticated } from '../errors';
import { isSessionRevoked } from '../services/sessions';

export const SESSION_COOKIE = 'sf_session';
export const CSRF_COOKIE = 'sf_csrf';
export const CSRF_HEADER = 'x-csrf-token';
const ALGORITHM = 'HS256' as const; // pinned: tokens with any other alg are refused

export type AuthContext = { userId: string; via: 'cookie' | 'bearer' };

export function signSessionToken(config: Config, userId: string): string {
  return jwt.sign({}, config.jwt.secret, {
    algorithm: ALGORITHM,
    subject: userId,
    issuer: config.jwt.issuer,
    audience: config.jwt.audience,
    expiresIn: config.jwt.ttlMinutes * 60,
    jwtid: crypto.randomUUID(),
  });
}

export type VerifiedToken = { userId: string; jti: string; expiresAt: Date };

/** The token's user, id and expiry when its signature, issuer, audience and expiry hold. */
export function verifySessionToken(config: Config, token: string): VerifiedToken | null {
  try {
    const payload = jwt.verify(token, config.jwt.secret, {
      algorithms: [ALGORITHM],
      issuer: config.jwt.issuer,
      audience: config.jwt.audience,
    });
    if (typeof payload !== 'object') return null;
    const { sub, jti, exp } = payload;
    if (typeof sub !== 'string' || typeof jti !== 'string' || typeof exp !== 'number') return null;
    return { userId: sub, jti, expiresAt: new Date(exp * 1000) };
  } catch {
    return null;
  }
}

/** Valid and not withdrawn by signing out. */
async function liveToken(config: Config, token: string): Promise<VerifiedToken | null> {
  const verified = verifySessionToken(config, token);
  if (!verified || (await isSessionRevoked(verified.jti))) return null;
  return verified;
}

/** The session token this request carries and how (Bearer first, then the cookie), unverified. */
function carriedToken(req: Request): { token: string; via: AuthContext['via'] } | null {
  const header = req.get('authorization');
  if (header?.startsWith('Bearer ')) return { token: header.slice(7).trim(), via: 'bearer' };
  const cookie = req.cookies?.[SESSION_COOKIE] as string | undefined;
  return cookie == null ? null : { token: cookie, via: 'cookie' };
}

/** The session token this request carries (Bearer first, then the cookie), unverified. */
export const presentedToken = (req: Request): string | null => carriedToken(req)?.token ?? null;

/** Sets the session and CSRF cookies for the web client; returns the CSRF value. */
export function setSessionCookies(res: Response, config: Config, token: string): string {
  const csrf = crypto.randomBytes(24).toString('base64url');
  const common = {
    sameSite: 'lax' as const,
    secure: config.production,
    path: '/',
    maxAge: config.jwt.ttlMinutes * 60_000,
  };
  res.cookie(SESSION_COOKIE, token, { ...common, httpOnly: true });
  res.cookie(CSRF_COOKIE, csrf, { ...common, httpOnly: false });
  return csrf;
}

export function clearSessionCookies(res: Response, config: Config) {
  const common = { sameSite: 'lax' as const, secure: config.production, path: '/' };
  res.clearCookie(SESSION_COOKIE, { ...common, httpOnly: true });
  res.clearCookie(CSRF_COOKIE, common);
}

/**
 * Reads a Bearer token or the session cookie into `res.locals.auth`. Unsafe requests that
 * authenticate by cookie must echo the CSRF cookie in the `x-csrf-token` header (double submit).
 */
export function authenticate(config: Config) {
  return async (req: Request, res: Response, next: NextFunction) => {
    const carried = carriedToken(req);
    if (carried?.via === 'bearer') {
      const token = await liveToken(config, carried.token);
      if (!token) return next(unauthenticated('Your session is not valid. Sign in again.'));
      res.locals.auth = { userId: token.userId, via: 'bearer' } satisfies AuthContext;
      return next();
    }
    if (!carried?.token) return next();
    const token = await liveToken(config, carried.token);
    if (!token) {
      clearSessionCookies(res, config);
      return next();
    }
    const { userId } = token;
    if (!['GET', 'HEAD', 'OPTIONS'].includes(req.method)) {
      const sent = req.get(CSRF_HEADER) ?? '';
      const expected = (req.cookies?.[CSRF_COOKIE] as string | undefined) ?? '';
      if (!expected || !safeEqual(sent, expected))
        return next(
          new AppError(403, ERROR_CODES.csrf, 'The form expired. Reload the page and try again.'),
        );
    }
    res.locals.auth = { userId, via: 'cookie' } satisfies AuthContext;
    next();
  };
}

function safeEqual(a: string, b: string) {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && crypto.timingSafeEqual(x, y);
}

export function requireAuth(_req: Request, res: Response, next: NextFunction) {
  if (!res.locals.auth) return next(unauthenticated());
  next();
}

export function authOf(res: Response): AuthContext {
  const auth = res.locals.auth as AuthContext | undefined;
  if (!auth) throw unauthenticated();
  return auth;
}
