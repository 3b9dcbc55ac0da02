import { Router, type Request, type Response } from 'express';
import { depsOf } from '../app';
import { notFound } from '../errors';
import { readOutbox } from '../mail/outbox';

const OUTBOX_LIMIT = 50;

/**
 * Development tools. The outbox lists what the local mail sink received, so invitation links
 * can be followed without a real mailbox. It needs no sign-in (the person testing may not have
 * an account yet), which is why it is never served in production, whatever `OUTBOX_ENABLED`
 * says: it then answers 404 as if it did not exist.
 */
export function devRoutes() {
  const router = Router();

  router.get('/outbox', async (req: Request, res: Response) => {
    const { config } = depsOf(req);
    if (config.production || !config.outboxEnabled) throw notFound('API route');
    res.json({ items: await readOutbox(config.mail.sinkDir, { limit: OUTBOX_LIMIT }) });
  });

  return router;
}
