import type { NextFunction, Request, Response } from 'express';
import { can, type Action, type Role } from '@/shared/roles';
import { forbidden, notFound } from '../errors';
import { Membership } from '../models';
import { isUuid } from '../services/vehicle-access';
import { authOf } from './auth';

export type MemberContext = {
  membershipId: string;
  workshopId: string;
  userId: string;
  role: Role;
};

/**
 * Resolves `:workshopId` to the caller's membership. Not a member → 404, so another
 * workshop's existence is never confirmed.
 */
export async function loadMembership(req: Request, res: Response, next: NextFunction) {
  const { userId } = authOf(res);
  const workshopId = String(req.params.workshopId ?? '');
  const m = isUuid(workshopId) ? await Membership.findOne({ where: { workshopId, userId } }) : null;
  if (!m) return next(notFound('Workshop'));
  res.locals.member = {
    membershipId: m.id,
    workshopId,
    userId,
    role: m.role,
  } satisfies MemberContext;
  next();
}

export function memberOf(res: Response): MemberContext {
  return res.locals.member as MemberContext;
}

/** 403 unless the caller's role allows the action (shared/roles.ts is the one table). */
export function requireAction(action: Action) {
  return (_req: Request, res: Response, next: NextFunction) => {
    if (!can(memberOf(res).role, action)) return next(forbidden());
    next();
  };
}
