import { Router, type Request, type Response } from 'express';
import {
  auditListQuery,
  createInvitationRequest,
  updateMemberRequest,
  updateWorkshopRequest,
  type AuditListQuery,
} from '@/shared/schemas/workshop';
import { appUrlOf, depsOf } from '../app';
import { validate, queryOf } from '../middleware/validate';
import { memberOf, requireAction } from '../middleware/workshop';
import { listAuditEntries } from '../services/audit';
import { createInvitation, listInvitations, revokeInvitation } from '../services/invitations';
import { listMembers, removeMember, updateMemberRole } from '../services/members';
import { getWorkshop, updateWorkshop } from '../services/workshops';

/** Mounted under /api/workshops/:workshopId after requireAuth + loadMembership. */
export function workshopRoutes() {
  const router = Router();

  router.get('/', requireAction('workshop.read'), async (_req: Request, res: Response) => {
    res.json(await getWorkshop(memberOf(res)));
  });

  router.patch(
    '/',
    requireAction('workshop.update'),
    validate({ body: updateWorkshopRequest }),
    async (req: Request, res: Response) => {
      res.json(await updateWorkshop(memberOf(res), req.body));
    },
  );

  router.get('/members', requireAction('members.read'), async (_req: Request, res: Response) => {
    res.json({ items: await listMembers(memberOf(res).workshopId) });
  });

  router.patch(
    '/members/:membershipId',
    requireAction('members.manage'),
    validate({ body: updateMemberRequest }),
    async (req: Request, res: Response) => {
      res.json(
        await updateMemberRole(memberOf(res), String(req.params.membershipId), req.body.role),
      );
    },
  );

  router.delete(
    '/members/:membershipId',
    requireAction('members.manage'),
    async (req: Request, res: Response) => {
      await removeMember(memberOf(res), String(req.params.membershipId));
      res.status(204).end();
    },
  );

  router.get(
    '/invitations',
    requireAction('members.manage'),
    async (_req: Request, res: Response) => {
      res.json({ items: await listInvitations(memberOf(res).workshopId) });
    },
  );

  router.post(
    '/invitations',
    requireAction('members.manage'),
    validate({ body: createInvitationRequest }),
    async (req: Request, res: Response) => {
      const { mailer } = depsOf(req);
      res
        .status(201)
        .json(await createInvitation(memberOf(res), req.body, { mailer, appUrl: appUrlOf(req) }));
    },
  );

  router.delete(
    '/invitations/:invitationId',
    requireAction('members.manage'),
    async (req: Request, res: Response) => {
      await revokeInvitation(memberOf(res), String(req.params.invitationId));
      res.status(204).end();
    },
  );

  router.get(
    '/audit',
    requireAction('audit.read'),
    validate({ query: auditListQuery }),
    async (_req: Request, res: Response) => {
      res.json({
        items: await listAuditEntries(memberOf(res).workshopId, queryOf<AuditListQuery>(res)),
      });
    },
  );

  return router;
}
