import {
  literal,
  Op,
  type Model,
  type ModelStatic,
  type Transaction,
  type WhereOptions,
} from 'sequelize';
import type { VehicleAccessResponse } from '@/shared/schemas/vehicle';
import { AppError, badRequest, notFound } from '../errors';
import type { MemberContext } from '../middleware/workshop';
import { Membership, User, Vehicle, VehicleAccess } from '../models';
import { audit } from './audit';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export const isUuid = (s: unknown): s is string => typeof s === 'string' && UUID.test(s);

export type FindVehicleOptions = {
  transaction?: Transaction;
  /** Take a row lock (SELECT … FOR UPDATE) so a concurrent writer waits for this transaction. */
  lock?: boolean;
  /** Also find a soft-deleted vehicle (restore). Clients never see deleted vehicles. */
  includeDeleted?: boolean;
};

/**
 * The one gate for anything hanging off a vehicle: another workshop's vehicle, and a vehicle
 * not shared with a client, both answer 404 so their existence is never confirmed.
 */
export async function findVehicleFor(
  member: MemberContext,
  vehicleId: string,
  opts: FindVehicleOptions = {},
): Promise<Vehicle> {
  if (!isUuid(vehicleId)) throw notFound('Vehicle');
  const isClient = member.role === 'client';
  const vehicle = await Vehicle.findOne({
    where: { id: vehicleId, workshopId: member.workshopId },
    paranoid: !(opts.includeDeleted && !isClient),
    transaction: opts.transaction,
    lock: opts.lock && opts.transaction ? opts.transaction.LOCK.UPDATE : undefined,
  });
  if (!vehicle) throw notFound('Vehicle');
  if (isClient && !(await hasAccess(vehicle.id, member.userId, opts.transaction)))
    throw notFound('Vehicle');
  return vehicle;
}

/**
 * For records reached through their vehicle: a hidden vehicle is reported as the record itself
 * not found, so the answer does not hint that the record exists. Other errors pass through.
 */
export const renameNotFound = (what: string) => (err: unknown) => {
  throw err instanceof AppError && err.status === 404 ? notFound(what) : err;
};

export type FindRowOptions = {
  transaction?: Transaction;
  /** Take a row lock on the record (not its vehicle) so a concurrent writer waits. */
  lock?: boolean;
  /** False to also find a soft-deleted record. */
  paranoid?: boolean;
};

/** A record of the member's workshop by id; a malformed id or another workshop's record is 404 `label`. */
export async function findInWorkshop<M extends Model>(
  model: ModelStatic<M>,
  label: string,
  member: MemberContext,
  id: string,
  opts: FindRowOptions = {},
): Promise<M> {
  if (!isUuid(id)) throw notFound(label);
  const row = await model.findOne({
    where: { id, workshopId: member.workshopId } as WhereOptions,
    paranoid: opts.paranoid,
    transaction: opts.transaction,
    lock: opts.lock && opts.transaction ? opts.transaction.LOCK.UPDATE : undefined,
  });
  if (!row) throw notFound(label);
  return row;
}

/** A record hanging off a vehicle, and that vehicle through the gate (a hidden vehicle is 404 `label`). */
export async function findThroughVehicle<M extends Model & { vehicleId: string }>(
  model: ModelStatic<M>,
  label: string,
  member: MemberContext,
  id: string,
  opts: FindRowOptions = {},
): Promise<{ row: M; vehicle: Vehicle }> {
  const row = await findInWorkshop(model, label, member, id, opts);
  const vehicle = await findVehicleFor(member, row.vehicleId, {
    transaction: opts.transaction,
  }).catch(renameNotFound(label));
  return { row, vehicle };
}

async function hasAccess(vehicleId: string, userId: string, transaction?: Transaction) {
  return (await VehicleAccess.count({ where: { vehicleId, userId }, transaction })) > 0;
}

/** A WHERE fragment for vehicle lists: clients get only the vehicles shared with them. */
export function visibleVehiclesWhere(member: MemberContext): WhereOptions {
  if (member.role !== 'client') return {};
  const userId = Vehicle.sequelize!.escape(member.userId);
  return {
    id: {
      [Op.in]: literal(
        `(SELECT va.vehicle_id FROM vehicle_access va WHERE va.user_id = ${userId})`,
      ),
    },
  };
}

function toAccessResponse(row: VehicleAccess): VehicleAccessResponse {
  return {
    userId: row.userId,
    name: row.user?.name ?? '',
    email: row.user?.email ?? '',
    grantedAt: row.createdAt.toISOString(),
  };
}

export async function listAccess(member: MemberContext, vehicleId: string) {
  const vehicle = await findVehicleFor(member, vehicleId);
  const rows = await VehicleAccess.findAll({
    where: { vehicleId: vehicle.id },
    include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
    order: [['createdAt', 'ASC']],
  });
  return rows.map(toAccessResponse);
}

/** Share a vehicle with a client-role member of the same workshop. Sharing twice is a no-op (200). */
export async function grantAccess(member: MemberContext, vehicleId: string, userId: string) {
  return Vehicle.sequelize!.transaction(async (transaction) => {
    const vehicle = await findVehicleFor(member, vehicleId, { transaction, lock: true });
    const clientMembership = await Membership.findOne({
      where: { workshopId: member.workshopId, userId, role: 'client' },
      transaction,
    });
    if (!clientMembership) throw badRequest({ userId: 'Choose a client of this workshop' });
    const existing = await VehicleAccess.findOne({
      where: { vehicleId: vehicle.id, userId },
      transaction,
    });
    let row = existing;
    if (!row) {
      row = await VehicleAccess.create(
        {
          workshopId: member.workshopId,
          vehicleId: vehicle.id,
          userId,
          grantedById: member.userId,
        },
        { transaction },
      );
      await audit(transaction, {
        workshopId: member.workshopId,
        actorId: member.userId,
        action: 'vehicle.share',
        entityType: 'vehicle',
        entityId: vehicle.id,
        summary: `Shared ${describeVehicle(vehicle)} with a client`,
        changes: { userId },
      });
    }
    row.user =
      (await User.findByPk(userId, { attributes: ['id', 'name', 'email'], transaction })) ??
      undefined;
    return { access: toAccessResponse(row), created: !existing };
  });
}

/** Stop sharing; revoking access that is not there is a no-op. */
export async function revokeAccess(member: MemberContext, vehicleId: string, userId: string) {
  await Vehicle.sequelize!.transaction(async (transaction) => {
    const vehicle = await findVehicleFor(member, vehicleId, { transaction, lock: true });
    if (!isUuid(userId)) return;
    const removed = await VehicleAccess.destroy({
      where: { vehicleId: vehicle.id, userId },
      transaction,
    });
    if (removed)
      await audit(transaction, {
        workshopId: member.workshopId,
        actorId: member.userId,
        action: 'vehicle.unshare',
        entityType: 'vehicle',
        entityId: vehicle.id,
        summary: `Stopped sharing ${describeVehicle(vehicle)} with a client`,
        changes: { userId },
      });
  });
}

export const describeVehicle = (v: Pick<Vehicle, 'year' | 'make' | 'model'>) =>
  `${v.year} ${v.make} ${v.model}`;
