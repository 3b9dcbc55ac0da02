import {
  literal,
  Op,
  UniqueConstraintError,
  type FindAttributeOptions,
  type Transaction,
  type WhereOptions,
} from 'sequelize';
import { getBodyPlan } from '@/shared/body-plans';
import { can } from '@/shared/roles';
import { ERROR_CODES } from '@/shared/schemas/common';
import type {
  createVehicleRequest,
  updateVehicleRequest,
  vehicleListQuery,
  VehicleResponse,
} from '@/shared/schemas/vehicle';
import type { z } from 'zod';
import { AppError, badRequest, forbidden, notFound, staleVersion } from '../errors';
import type { MemberContext } from '../middleware/workshop';
import { Finding, MemberDecision, Vehicle } from '../models';
import { audit, diff, snapshot } from './audit';
import { describeVehicle, findVehicleFor, visibleVehiclesWhere } from './vehicle-access';

type CreateVehicle = z.output<typeof createVehicleRequest>;
type UpdateVehicle = z.output<typeof updateVehicleRequest>;
type VehicleListQuery = z.output<typeof vehicleListQuery>;

const EDITABLE = [
  'year',
  'make',
  'model',
  'bodyPlanKey',
  'chassisNumber',
  'bodyNumber',
  'clientName',
  'storage',
  'stage',
  'notes',
] as const;

/**
 * The list summary as correlated subqueries on indexed `vehicle_id` columns: one SQL statement for
 * the whole list, never a query per vehicle. "Open" findings are the ones not deleted.
 */
const SUMMARY: FindAttributeOptions = {
  include: [
    [
      literal('(SELECT COUNT(*) FROM surveys s WHERE s.vehicle_id = `Vehicle`.`id`)'),
      'summarySurveys',
    ],
    [
      literal(
        '(SELECT COUNT(*) FROM findings f WHERE f.vehicle_id = `Vehicle`.`id` AND f.deleted_at IS NULL)',
      ),
      'summaryFindings',
    ],
    [
      literal(
        '(SELECT MAX(f.severity) FROM findings f WHERE f.vehicle_id = `Vehicle`.`id` AND f.deleted_at IS NULL)',
      ),
      'summaryWorst',
    ],
    [
      literal(
        "(SELECT DATE_FORMAT(MAX(s.date), '%Y-%m-%d') FROM surveys s WHERE s.vehicle_id = `Vehicle`.`id`)",
      ),
      'summaryLastSurvey',
    ],
  ],
};

export function toVehicleResponse(v: Vehicle): VehicleResponse {
  const extra = (k: string) => v.get(k) as unknown;
  const worst = extra('summaryWorst');
  const last = extra('summaryLastSurvey');
  return {
    id: v.id,
    workshopId: v.workshopId,
    year: v.year,
    make: v.make,
    model: v.model,
    bodyPlanKey: v.bodyPlanKey,
    chassisNumber: v.chassisNumber,
    bodyNumber: v.bodyNumber,
    clientName: v.clientName,
    storage: v.storage,
    stage: v.stage,
    notes: v.notes,
    version: v.version,
    createdAt: v.createdAt.toISOString(),
    updatedAt: v.updatedAt.toISOString(),
    deletedAt: v.deletedAt ? v.deletedAt.toISOString() : null,
    summary: {
      surveys: Number(extra('summarySurveys') ?? 0),
      findings: Number(extra('summaryFindings') ?? 0),
      worstSeverity: worst == null ? null : Number(worst),
      lastSurveyDate: last == null ? null : String(last),
    },
  };
}

/** `%` and `_` in a search are literal characters, not wildcards. */
const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

export async function listVehicles(
  member: MemberContext,
  query: VehicleListQuery,
): Promise<VehicleResponse[]> {
  if (query.deleted && !can(member.role, 'vehicles.delete'))
    throw forbidden('Only an owner can list deleted vehicles.');
  const conditions: WhereOptions[] = [
    { workshopId: member.workshopId },
    visibleVehiclesWhere(member),
  ];
  if (query.deleted === 'only') conditions.push({ deletedAt: { [Op.ne]: null } });
  if (query.stage) conditions.push({ stage: query.stage });
  if (query.q) {
    const like = { [Op.like]: `%${likeEscape(query.q)}%` };
    conditions.push({
      [Op.or]: [
        { make: like },
        { model: like },
        { chassisNumber: like },
        { bodyNumber: like },
        { clientName: like },
      ],
    });
  }
  const rows = await Vehicle.findAll({
    where: { [Op.and]: conditions },
    attributes: SUMMARY,
    paranoid: !query.deleted,
    order: [
      ['updatedAt', 'DESC'],
      ['id', 'ASC'],
    ],
  });
  return rows.map(toVehicleResponse);
}

/** One vehicle with its summary (after the access check). */
export async function getVehicle(
  member: MemberContext,
  vehicleId: string,
  opts: { includeDeleted?: boolean } = {},
) {
  const vehicle = await findVehicleFor(member, vehicleId, opts);
  return withSummary(vehicle.id);
}

async function withSummary(id: string, transaction?: Transaction): Promise<VehicleResponse> {
  const row = await Vehicle.findOne({
    where: { id },
    attributes: SUMMARY,
    paranoid: false,
    transaction,
  });
  if (!row) throw notFound('Vehicle');
  return toVehicleResponse(row);
}

function assertBodyPlan(key: string) {
  if (!getBodyPlan(key)) throw badRequest({ bodyPlanKey: 'Choose one of the body plans' });
}

/**
 * Creates a vehicle. A client may send its own `id`, so a retried request returns the row the
 * first one made (created: false) instead of a second vehicle. An id taken in another
 * workshop is a conflict, answered without saying anything about that row.
 */
export async function createVehicle(member: MemberContext, body: CreateVehicle) {
  assertBodyPlan(body.bodyPlanKey);
  const existing = body.id ? await existingForRetry(member, body.id) : null;
  if (existing) return { vehicle: existing, created: false };
  try {
    const id = await Vehicle.sequelize!.transaction(async (transaction) => {
      const { id: clientId, ...fields } = body;
      const vehicle = await Vehicle.create(
        {
          ...(clientId ? { id: clientId } : {}),
          ...fields,
          workshopId: member.workshopId,
          createdById: member.userId,
        },
        { transaction },
      );
      await audit(transaction, {
        workshopId: member.workshopId,
        actorId: member.userId,
        action: 'vehicle.create',
        entityType: 'vehicle',
        entityId: vehicle.id,
        summary: `Added ${describeVehicle(vehicle)}`,
      });
      return vehicle.id;
    });
    return { vehicle: await withSummary(id), created: true };
  } catch (err) {
    // Two copies of the same request raced: the loser answers with the winner's row.
    if (err instanceof UniqueConstraintError && body.id) {
      const winner = await existingForRetry(member, body.id);
      if (winner) return { vehicle: winner, created: false };
    }
    throw err;
  }
}

async function existingForRetry(
  member: MemberContext,
  id: string,
): Promise<VehicleResponse | null> {
  const row = await Vehicle.findOne({
    where: { id },
    attributes: ['id', 'workshopId'],
    paranoid: false,
  });
  if (!row) return null;
  if (row.workshopId !== member.workshopId) throw idTaken();
  return withSummary(id);
}

export const idTaken = () =>
  new AppError(
    409,
    ERROR_CODES.conflict,
    'That id is already in use. Send the request without an id.',
    { id: 'Already in use' },
  );

/**
 * Applies an edit made against `version`. The row is locked for the transaction and saved through
 * Sequelize's optimistic lock, so of two edits made from the same version exactly one wins and
 * the other gets 409 without overwriting it.
 */
export async function updateVehicle(member: MemberContext, vehicleId: string, body: UpdateVehicle) {
  const { version, ...changes } = body;
  const id = await Vehicle.sequelize!.transaction(async (transaction) => {
    const vehicle = await findVehicleFor(member, vehicleId, { transaction, lock: true });
    if (vehicle.version !== version) throw staleVersion('vehicle');
    if (changes.bodyPlanKey !== undefined && changes.bodyPlanKey !== vehicle.bodyPlanKey) {
      assertBodyPlan(changes.bodyPlanKey);
      await assertZonesOnPlan(vehicle.id, changes.bodyPlanKey, transaction);
    }
    const before = snapshot(vehicle, EDITABLE);
    vehicle.set(changes);
    const changed = diff(before, snapshot(vehicle, EDITABLE), [...EDITABLE]);
    if (Object.keys(changed).length === 0) return vehicle.id;
    await vehicle.save({ transaction });
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'vehicle.update',
      entityType: 'vehicle',
      entityId: vehicle.id,
      summary: `Edited ${describeVehicle(vehicle)}: ${Object.keys(changed).join(', ')}`,
      changes: changed,
    });
    return vehicle.id;
  });
  return withSummary(id);
}

/** A vehicle cannot move to a plan that lacks a zone its findings or member decisions sit on. */
async function assertZonesOnPlan(vehicleId: string, planKey: string, transaction: Transaction) {
  const plan = getBodyPlan(planKey)!;
  const zoneKeys = new Set(plan.zones.map((z) => z.key));
  const [findings, decisions] = await Promise.all([
    Finding.findAll({
      where: { vehicleId },
      attributes: ['zoneKey'],
      group: ['zoneKey'],
      paranoid: false,
      transaction,
    }),
    MemberDecision.findAll({ where: { vehicleId }, attributes: ['zoneKey'], transaction }),
  ]);
  const used = new Set([...findings, ...decisions].map((r) => r.zoneKey));
  const missing = [...used].filter((k) => !zoneKeys.has(k));
  if (missing.length)
    throw badRequest({
      bodyPlanKey: `That plan has no ${missing.join(', ')}, where this vehicle has findings or repair decisions`,
    });
}

export async function deleteVehicle(member: MemberContext, vehicleId: string) {
  await Vehicle.sequelize!.transaction(async (transaction) => {
    const vehicle = await findVehicleFor(member, vehicleId, { transaction, lock: true });
    await vehicle.destroy({ transaction });
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'vehicle.delete',
      entityType: 'vehicle',
      entityId: vehicle.id,
      summary: `Deleted ${describeVehicle(vehicle)}`,
    });
  });
}

/** Brings a soft-deleted vehicle back; restoring one that is not deleted changes nothing. */
export async function restoreVehicle(member: MemberContext, vehicleId: string) {
  const id = await Vehicle.sequelize!.transaction(async (transaction) => {
    const vehicle = await findVehicleFor(member, vehicleId, {
      transaction,
      lock: true,
      includeDeleted: true,
    });
    if (vehicle.deletedAt) {
      await vehicle.restore({ transaction });
      await audit(transaction, {
        workshopId: member.workshopId,
        actorId: member.userId,
        action: 'vehicle.restore',
        entityType: 'vehicle',
        entityId: vehicle.id,
        summary: `Restored ${describeVehicle(vehicle)}`,
      });
    }
    return vehicle.id;
  });
  return withSummary(id);
}
