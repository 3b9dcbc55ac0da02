import type { Role } from '@/shared/roles';
import { Invitation, type Workshop } from '@/server/models';
import {
  hashInvitationToken,
  INVITATION_TTL_DAYS,
  newInvitationToken,
} from '@/server/services/invitations';
import { unique } from './index';

type InvitationPartial = Partial<{
  email: string;
  role: Role;
  invitedById: string | null;
  expiresAt: Date;
  acceptedAt: Date | null;
  revokedAt: Date | null;
}>;

/** An invitation row as the service stores it, and the token that only the e-mail would carry. */
export async function createInvitation(workshop: Workshop, partial: InvitationPartial = {}) {
  const token = newInvitationToken();
  const invitation = await Invitation.create({
    workshopId: workshop.id,
    invitedById: partial.invitedById ?? null,
    email: (partial.email ?? `${unique('invitee')}@example.test`).toLowerCase(),
    role: partial.role ?? 'inspector',
    tokenHash: hashInvitationToken(token),
    expiresAt: partial.expiresAt ?? new Date(Date.now() + INVITATION_TTL_DAYS * 24 * 3600_000),
    acceptedAt: partial.acceptedAt ?? null,
    revokedAt: partial.revokedAt ?? null,
  });
  return { invitation, token };
}
