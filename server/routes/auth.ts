import crypto from 'node:crypto';
import { Router, type Request, type Response } from 'express';
import {
  signInRequest,
  signUpRequest,
  updatePreferencesRequest,
  type SessionResponse,
} from '@/shared/schemas/auth';
import { depsOf } from '../app';
import type { Config } from '../config';
import {
  authOf,
  clearSessionCookies,
  CSRF_COOKIE,
  presentedToken,
  requireAuth,
  SESSION_COOKIE,
  setSessionCookies,
  signSessionToken,
  verifySessionToken,
} from '../middleware/auth';
import { signInRateLimit } from '../middleware/rate-limit';
import { validate } from '../middleware/validate';
import { sessionFor, signIn, signUp, updatePreferences } from '../services/auth';
import { revokeSession } from '../services/sessions';

/**
 * Signs the user in on this response: the httpOnly session cookie and the CSRF cookie for the
 * web client, and the token in the body for Bearer clients.
 */
export async function startSession(
  res: Response,
  config: Config,
  userId: string,
): Promise<SessionResponse> {
  const body = await sessionFor(userId);
  const token = signSessionToken(config, userId);
  const csrfToken = setSessionCookies(res, config, token);
  return { ...body, csrfToken, token };
}

/** The session answer for a request that is already signed in, keeping (or repairing) its CSRF cookie. */
async function currentSession(req: Request, res: Response): Promise<SessionResponse> {
  const { config } = depsOf(req);
  const auth = authOf(res);
  const body = await sessionFor(auth.userId);
  const existing = req.cookies?.[CSRF_COOKIE] as string | undefined;
  let csrfToken: string;
  if (existing) csrfToken = existing;
  else if (auth.via === 'cookie')
    // The CSRF cookie was lost (e.g. cleared by hand): pair the session cookie with a new one.
    csrfToken = setSessionCookies(res, config, req.cookies[SESSION_COOKIE] as string);
  else csrfToken = crypto.randomBytes(24).toString('base64url'); // Bearer clients need no CSRF token
  return { ...body, csrfToken };
}

export function authRoutes() {
  const router = Router();

  router.post(
    '/sign-up',
    validate({ body: signUpRequest }),
    async (req: Request, res: Response) => {
      const { config } = depsOf(req);
      const userId = await signUp(req.body, config.bcryptCost);
      res.status(201).json(await startSession(res, config, userId));
    },
  );

  router.post(
    '/sign-in',
    validate({ body: signInRequest }),
    signInRateLimit(),
    async (req: Request, res: Response) => {
      const { config } = depsOf(req);
      const userId = await signIn(req.body);
      res.json(await startSession(res, config, userId));
    },
  );

  // Idempotent: signing out without a session still clears whatever cookies are left. A valid
  // token presented (cookie or Bearer) is withdrawn, so a copy of it stops working too.
  router.post('/sign-out', async (req: Request, res: Response) => {
    const { config } = depsOf(req);
    const raw = presentedToken(req);
    const token = raw ? verifySessionToken(config, raw) : null;
    if (token) await revokeSession(token);
    clearSessionCookies(res, config);
    res.status(204).end();
  });

  router.get('/session', requireAuth, async (req: Request, res: Response) => {
    res.json(await currentSession(req, res));
  });

  router.patch(
    '/preferences',
    requireAuth,
    validate({ body: updatePreferencesRequest }),
    async (req: Request, res: Response) => {
      await updatePreferences(authOf(res).userId, req.body);
      res.json(await currentSession(req, res));
    },
  );

  return router;
}
