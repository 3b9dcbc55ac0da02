import type { Transaction } from 'sequelize';
import { can, ROLE_LABELS, type Role } from '@/shared/roles';
import { ERROR_CODES } from '@/shared/schemas/common';
import type { MemberResponse } from '@/shared/schemas/workshop';
import { AppError, forbidden, notFound } from '../errors';
import type { MemberContext } from '../middleware/workshop';
import { Membership, User, VehicleAccess } from '../models';
import { audit } from './audit';

const lastOwner = (verb: string) =>
  new AppError(
    409,
    ERROR_CODES.conflict,
    `A workshop needs at least one owner. Make someone else an owner before you ${verb} this one.`,
  );

function toResponse(m: Membership): MemberResponse {
  return {
    id: m.id,
    userId: m.userId,
    name: m.user?.name ?? '',
    email: m.user?.email ?? '',
    role: m.role,
    createdAt: m.createdAt.toISOString(),
  };
}

export async function listMembers(workshopId: string): Promise<MemberResponse[]> {
  const rows = await Membership.findAll({
    where: { workshopId },
    include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
    order: [['createdAt', 'ASC']],
  });
  return rows.map(toResponse);
}

/**
 * Locks every membership of the workshop (one query, always in the same order, so concurrent
 * changes queue instead of deadlocking), then re-checks the caller's own role: two owners
 * demoting each other at once cannot leave the workshop without an owner.
 */
async function lockForChange(
  member: MemberContext,
  membershipId: string,
  transaction: Transaction,
) {
  const all = await Membership.findAll({
    where: { workshopId: member.workshopId },
    order: [['id', 'ASC']],
    lock: transaction.LOCK.UPDATE,
    transaction,
  });
  const actor = all.find((m) => m.id === member.membershipId);
  if (!actor) throw notFound('Workshop');
  if (!can(actor.role, 'members.manage')) throw forbidden();
  const target = all.find((m) => m.id === membershipId);
  if (!target) throw notFound('Member');
  target.user =
    (await User.findByPk(target.userId, { attributes: ['id', 'name', 'email'], transaction })) ??
    undefined;
  const owners = all.filter((m) => m.role === 'owner').length;
  return { target, onlyOwner: target.role === 'owner' && owners <= 1 };
}

export async function updateMemberRole(
  member: MemberContext,
  membershipId: string,
  role: Role,
): Promise<MemberResponse> {
  const sequelize = Membership.sequelize!;
  return sequelize.transaction(async (transaction: Transaction) => {
    const { target, onlyOwner } = await lockForChange(member, membershipId, transaction);
    if (target.role === role) return toResponse(target);
    if (onlyOwner) throw lastOwner('change');
    const from = target.role;
    target.role = role;
    await target.save({ transaction });
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'member.update',
      entityType: 'membership',
      entityId: target.id,
      summary: `Changed ${target.user?.name ?? 'a member'} from ${ROLE_LABELS[from]} to ${ROLE_LABELS[role]}`,
      changes: { role: { from, to: role } },
    });
    return toResponse(target);
  });
}

/** Removes the member and every vehicle they were given in this workshop. */
export async function removeMember(member: MemberContext, membershipId: string): Promise<void> {
  const sequelize = Membership.sequelize!;
  await sequelize.transaction(async (transaction: Transaction) => {
    const { target, onlyOwner } = await lockForChange(member, membershipId, transaction);
    if (onlyOwner) throw lastOwner('remove');
    const revoked = await VehicleAccess.destroy({
      where: { workshopId: member.workshopId, userId: target.userId },
      transaction,
    });
    await target.destroy({ transaction });
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'member.remove',
      entityType: 'membership',
      entityId: target.id,
      summary: `Removed ${target.user?.name ?? 'a member'} (${ROLE_LABELS[target.role]})`,
      changes: { userId: target.userId, role: target.role, vehicleAccessRemoved: revoked },
    });
  });
}
