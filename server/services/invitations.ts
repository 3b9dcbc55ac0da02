import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import { ROLE_LABELS } from '@/shared/roles';
import { acceptInvitationRequest, type InvitationPreview } from '@/shared/schemas/auth';
import { ERROR_CODES } from '@/shared/schemas/common';
import type { CreateInvitationRequest, InvitationResponse } from '@/shared/schemas/workshop';
import { AppError, notFound } from '../errors';
import { escapeHtml, mailFailed } from '../mail/compose';
import type { Mailer } from '../mail/transport';
import type { MemberContext } from '../middleware/workshop';
import { Invitation, Membership, User, Workshop } from '../models';
import { audit } from './audit';
import { emailTaken } from './auth';
import { hashPassword } from './passwords';
import { hashLinkToken, LINK_TOKEN_FORMAT, newLinkToken } from './tokens';

export const INVITATION_TTL_DAYS = 7;
// Under these names the test factories make invitation rows as this service does.
export { hashLinkToken as hashInvitationToken, newLinkToken as newInvitationToken };

const linkNotValid = () =>
  new AppError(
    404,
    ERROR_CODES.notFound,
    'This invitation link is not valid any more: it expired, was withdrawn or was already used. Ask the workshop owner for a new one.',
  );

function toResponse(inv: Invitation, invitedByName: string | undefined): InvitationResponse {
  return {
    id: inv.id,
    email: inv.email,
    role: inv.role,
    invitedBy: invitedByName ?? '',
    expiresAt: inv.expiresAt.toISOString(),
    acceptedAt: inv.acceptedAt ? inv.acceptedAt.toISOString() : null,
    createdAt: inv.createdAt.toISOString(),
  };
}

/** Pending and accepted invitations of the workshop, newest first (withdrawn ones are gone). */
export async function listInvitations(workshopId: string): Promise<InvitationResponse[]> {
  const rows = await Invitation.findAll({
    where: { workshopId, revokedAt: null },
    include: [{ model: User, as: 'invitedBy', attributes: ['name'] }],
    order: [['createdAt', 'DESC']],
  });
  return rows.map((r) => toResponse(r, r.invitedBy?.name));
}

/**
 * Creates the invitation and sends its e-mail inside one transaction: if the mail cannot be
 * sent, no invitation is left behind that nobody received. A pending invitation to the same
 * address is withdrawn, so only the newest link works.
 */
export async function createInvitation(
  member: MemberContext,
  body: CreateInvitationRequest,
  /** `appUrl` without a trailing slash, as appUrlOf gives it. */
  opts: { mailer: Mailer; appUrl: string },
): Promise<InvitationResponse> {
  const sequelize = Invitation.sequelize!;
  return sequelize.transaction(async (transaction: Transaction) => {
    const workshop = await Workshop.findByPk(member.workshopId, { transaction });
    const inviter = await User.findByPk(member.userId, { transaction });
    if (!workshop || !inviter) throw notFound('Workshop');

    const existingUser = await User.findOne({ where: { email: body.email }, transaction });
    if (
      existingUser &&
      (await Membership.findOne({
        where: { workshopId: workshop.id, userId: existingUser.id },
        transaction,
      }))
    )
      throw new AppError(
        409,
        ERROR_CODES.conflict,
        'This person is already a member of the workshop.',
        {
          email: 'Already a member',
        },
      );

    const [replaced] = await Invitation.update(
      { revokedAt: new Date() },
      {
        where: { workshopId: workshop.id, email: body.email, acceptedAt: null, revokedAt: null },
        transaction,
      },
    );
    const token = newLinkToken();
    const invitation = await Invitation.create(
      {
        workshopId: workshop.id,
        invitedById: inviter.id,
        email: body.email,
        role: body.role,
        tokenHash: hashLinkToken(token),
        expiresAt: new Date(Date.now() + INVITATION_TTL_DAYS * 24 * 3600_000),
      },
      { transaction },
    );
    await audit(transaction, {
      workshopId: workshop.id,
      actorId: inviter.id,
      action: 'invitation.create',
      entityType: 'invitation',
      entityId: invitation.id,
      summary: `${inviter.name} invited ${body.email} as ${ROLE_LABELS[body.role]}${replaced ? ' (replacing an earlier invitation)' : ''}`,
      changes: { email: body.email, role: body.role },
    });

    const link = `${opts.appUrl}/invitation/${token}`;
    try {
      await opts.mailer.send(
        invitationMail({
          to: body.email,
          link,
          workshop: workshop.name,
          inviter: inviter.name,
          role: body.role,
        }),
      );
    } catch {
      throw mailFailed(
        'The invitation e-mail could not be sent. Nothing was saved; try again in a moment.',
      );
    }
    return toResponse(invitation, inviter.name);
  });
}

function invitationMail(p: {
  to: string;
  link: string;
  workshop: string;
  inviter: string;
  role: CreateInvitationRequest['role'];
}) {
  const role = ROLE_LABELS[p.role];
  const text = [
    `${p.inviter} has invited you to join ${p.workshop} on Soundframe as ${role}.`,
    '',
    'Open this link to accept and choose your password:',
    p.link,
    '',
    `The link works once and expires in ${INVITATION_TTL_DAYS} days. If you did not expect this invitation, ignore this e-mail.`,
  ].join('\n');
  const html =
    `<p>${escapeHtml(p.inviter)} has invited you to join <strong>${escapeHtml(p.workshop)}</strong> on Soundframe as ${escapeHtml(role)}.</p>` +
    `<p><a href="${escapeHtml(p.link)}">Accept the invitation</a></p>` +
    `<p>The link works once and expires in ${INVITATION_TTL_DAYS} days. If you did not expect this invitation, ignore this e-mail.</p>`;
  return {
    to: p.to,
    subject: `${p.inviter} invited you to ${p.workshop} on Soundframe`,
    text,
    html,
  };
}

/** Withdraws a pending invitation: its link stops working at once. */
export async function revokeInvitation(member: MemberContext, invitationId: string): Promise<void> {
  const sequelize = Invitation.sequelize!;
  await sequelize.transaction(async (transaction: Transaction) => {
    const inv = await Invitation.findOne({
      where: { id: invitationId, workshopId: member.workshopId, revokedAt: null },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!inv) throw notFound('Invitation');
    if (inv.acceptedAt)
      throw new AppError(
        409,
        ERROR_CODES.conflict,
        'This invitation was already accepted. Remove the member instead.',
      );
    inv.revokedAt = new Date();
    await inv.save({ transaction });
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'invitation.revoke',
      entityType: 'invitation',
      entityId: inv.id,
      summary: `Withdrew the invitation to ${inv.email}`,
    });
  });
}

function usableWhere(token: string) {
  return {
    tokenHash: hashLinkToken(token),
    acceptedAt: null,
    revokedAt: null,
    expiresAt: { [Op.gt]: new Date() },
  };
}

export async function previewInvitation(token: string): Promise<InvitationPreview> {
  const inv = LINK_TOKEN_FORMAT.test(token)
    ? await Invitation.findOne({
        where: usableWhere(token),
        include: [
          { model: Workshop, as: 'workshop', attributes: ['name'] },
          { model: User, as: 'invitedBy', attributes: ['name'] },
        ],
      })
    : null;
  if (!inv) throw linkNotValid();
  return {
    workshopName: inv.workshop?.name ?? '',
    email: inv.email,
    role: inv.role,
    invitedBy: inv.invitedBy?.name ?? 'The workshop owner',
    expiresAt: inv.expiresAt.toISOString(),
  };
}

/**
 * Accepts an invitation and returns the user id to sign in. A new person sends a name and a
 * password (`acceptInvitationRequest`). If an account with the invited address already exists,
 * its owner must be signed in as that account; the membership is then added to it.
 * The invitation row is locked, so one link makes at most one membership.
 */
export async function acceptInvitation(
  token: string,
  opts: { signedInUserId: string | null; body: unknown; bcryptCost: number },
): Promise<string> {
  const sequelize = Invitation.sequelize!;
  return sequelize.transaction(async (transaction: Transaction) => {
    const inv = LINK_TOKEN_FORMAT.test(token)
      ? await Invitation.findOne({
          where: usableWhere(token),
          lock: transaction.LOCK.UPDATE,
          transaction,
        })
      : null;
    if (!inv) throw linkNotValid();

    let user = await User.findOne({ where: { email: inv.email }, transaction });
    if (user) {
      if (opts.signedInUserId !== user.id)
        throw new AppError(
          409,
          ERROR_CODES.conflict,
          `An account for ${inv.email} already exists. Sign in with it, then open the invitation link again.`,
        );
      if (
        await Membership.findOne({
          where: { workshopId: inv.workshopId, userId: user.id },
          transaction,
        })
      )
        throw new AppError(409, ERROR_CODES.conflict, 'You are already a member of this workshop.');
    } else {
      const body = acceptInvitationRequest.parse(opts.body ?? {});
      const passwordHash = await hashPassword(body.password, opts.bcryptCost);
      try {
        user = await User.create(
          { email: inv.email, name: body.name, passwordHash },
          { transaction },
        );
      } catch (e) {
        if (e instanceof UniqueConstraintError) throw emailTaken();
        throw e;
      }
    }

    const membership = await Membership.create(
      { workshopId: inv.workshopId, userId: user.id, role: inv.role },
      { transaction },
    );
    inv.acceptedAt = new Date();
    await inv.save({ transaction });
    await audit(transaction, {
      workshopId: inv.workshopId,
      actorId: user.id,
      action: 'member.add',
      entityType: 'membership',
      entityId: membership.id,
      summary: `${user.name} joined as ${ROLE_LABELS[inv.role]} by invitation`,
      changes: { invitationId: inv.id, role: inv.role },
    });
    return user.id;
  });
}
