import { Router, type Request, type Response } from 'express';
import { depsOf } from '../app';
import type { AuthContext } from '../middleware/auth';
import { acceptInvitation, previewInvitation } from '../services/invitations';
import { startSession } from './auth';

/** The signed-out side of invitations: the link in the e-mail leads here. */
export function invitationPublicRoutes() {
  const router = Router();

  router.get('/:token', async (req: Request, res: Response) => {
    res.json(await previewInvitation(String(req.params.token)));
  });

  // The body is checked inside the service: a person who already has an account and is signed
  // in as it sends none.
  router.post('/:token/accept', async (req: Request, res: Response) => {
    const { config } = depsOf(req);
    const auth = res.locals.auth as AuthContext | undefined;
    const userId = await acceptInvitation(String(req.params.token), {
      signedInUserId: auth?.userId ?? null,
      body: req.body,
      bcryptCost: config.bcryptCost,
    });
    res.json(await startSession(res, config, userId));
  });

  return router;
}
