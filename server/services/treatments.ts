import { literal, UniqueConstraintError, type Transaction } from 'sequelize';
import type { z } from 'zod';
import { getBodyPlan } from '@/shared/body-plans';
import type {
  correctTreatmentRequest,
  createTreatmentRequest,
  TreatmentData,
  TreatmentResponse,
} from '@/shared/schemas/treatment';
import { recheckDueDates } from '@/shared/treatments';
import { badRequest, notFound, staleVersion } from '../errors';
import type { MemberContext } from '../middleware/workshop';
import { ReCheck, Treatment, TreatmentVersion, User, type Vehicle } from '../models';
import { audit, diff } from './audit';
import {
  describeVehicle,
  findThroughVehicle,
  findVehicleFor,
  type FindRowOptions,
} from './vehicle-access';
import { idTaken } from './vehicles';
import { settingsOf } from './workshops';

type CreateTreatment = z.output<typeof createTreatmentRequest>;
type CorrectTreatment = z.output<typeof correctTreatmentRequest>;

const DETAILS = [
  { model: User, as: 'recordedBy', attributes: ['id', 'name'] },
  {
    model: TreatmentVersion,
    as: 'versions',
    include: [{ model: User, as: 'changedBy', attributes: ['id', 'name'] }],
  },
];

export function toTreatmentResponse(t: Treatment): TreatmentResponse {
  return {
    ...t.data,
    id: t.id,
    vehicleId: t.vehicleId,
    version: t.version,
    recordedById: t.recordedById ?? null,
    recordedByName: t.recordedBy?.name ?? null,
    createdAt: t.createdAt.toISOString(),
    updatedAt: t.updatedAt.toISOString(),
    versions: [...(t.versions ?? [])]
      .sort((a, b) => a.version - b.version)
      .map((v) => ({
        version: v.version,
        reason: v.reason,
        changedByName: v.changedBy?.name ?? null,
        changedAt: v.createdAt.toISOString(),
        data: v.data,
      })),
  };
}

/** The zones must all be on the vehicle's body plan; repeats are dropped. */
export function checkZones(vehicle: Vehicle, zoneKeys: string[]): string[] {
  const plan = getBodyPlan(vehicle.bodyPlanKey);
  const known = new Set(plan?.zones.map((z) => z.key) ?? []);
  const unknown = zoneKeys.filter((z) => !known.has(z));
  if (unknown.length)
    throw badRequest({
      zoneKeys: `Not zones of this vehicle’s body plan: ${unknown.slice(0, 5).join(', ')}`,
    });
  return [...new Set(zoneKeys)];
}

/** What is stored as the treatment's data: the request without its id and the confirmation. */
function dataOf(body: CreateTreatment | CorrectTreatment, zoneKeys: string[]): TreatmentData {
  const fields: Record<string, unknown> = { ...body };
  for (const k of ['id', 'labelConfirmed', 'version', 'reason']) delete fields[k];
  return { ...(fields as TreatmentData), zoneKeys };
}

async function withDetails(id: string, transaction?: Transaction) {
  const row = await Treatment.findByPk(id, { include: DETAILS, transaction });
  if (!row) throw notFound('Treatment');
  return toTreatmentResponse(row);
}

/** A treatment and its vehicle, through the vehicle gate (404 for another workshop or an unshared client). */
async function findTreatmentFor(
  member: MemberContext,
  treatmentId: string,
  opts: FindRowOptions = {},
) {
  const { row, vehicle } = await findThroughVehicle(
    Treatment,
    'Treatment',
    member,
    treatmentId,
    opts,
  );
  return { treatment: row, vehicle };
}

export async function listTreatments(member: MemberContext, vehicleId: string) {
  const vehicle = await findVehicleFor(member, vehicleId);
  const rows = await Treatment.findAll({
    where: { vehicleId: vehicle.id },
    include: DETAILS,
    order: [
      ['appliedAt', 'DESC'],
      ['id', 'ASC'],
    ],
  });
  return rows.map(toTreatmentResponse);
}

export async function getTreatment(member: MemberContext, treatmentId: string) {
  const { treatment } = await findTreatmentFor(member, treatmentId);
  return withDetails(treatment.id);
}

const planSummary = (data: TreatmentData) =>
  `${data.method} with ${data.productName} (reg. ${data.registrationNumber}) on ${data.zoneKeys.join(', ')}`;

/**
 * Records a treatment and plans its re-checks from the workshop's plan for the agent and method,
 * in one transaction. An applicator recording their own work is assigned the re-checks.
 * A retried request with the same `id` returns the first one's row.
 */
export async function createTreatment(
  member: MemberContext,
  vehicleId: string,
  body: CreateTreatment,
) {
  const existing = body.id ? await existingForRetry(member, body.id, vehicleId) : null;
  if (existing) return { treatment: existing, created: false };
  try {
    const id = await Treatment.sequelize!.transaction(async (transaction) => {
      const vehicle = await findVehicleFor(member, vehicleId, { transaction, lock: true });
      const data = dataOf(body, checkZones(vehicle, body.zoneKeys));
      const settings = (await settingsOf(member.workshopId, transaction)).treatments;
      const dueDates = recheckDueDates(data.appliedAt, data.targetAgent, data.method, settings);
      const treatment = await Treatment.create(
        {
          ...(body.id ? { id: body.id } : {}),
          workshopId: member.workshopId,
          vehicleId: vehicle.id,
          recordedById: member.userId,
          data,
          appliedAt: new Date(data.appliedAt),
          zoneKeys: data.zoneKeys,
          method: data.method,
          targetAgent: data.targetAgent,
        },
        { transaction },
      );
      await ReCheck.bulkCreate(
        dueDates.map((dueDate) => ({
          workshopId: member.workshopId,
          vehicleId: vehicle.id,
          treatmentId: treatment.id,
          zoneKeys: data.zoneKeys,
          dueDate,
          assigneeId: member.role === 'applicator' ? member.userId : null,
        })),
        { transaction },
      );
      await audit(transaction, {
        workshopId: member.workshopId,
        actorId: member.userId,
        action: 'treatment.create',
        entityType: 'treatment',
        entityId: treatment.id,
        summary: `Recorded ${planSummary(data)} on ${describeVehicle(vehicle)}; ${dueDates.length} re-checks planned`,
        changes: { dueDates },
      });
      return treatment.id;
    });
    return { treatment: await withDetails(id), created: true };
  } catch (err) {
    if (err instanceof UniqueConstraintError && body.id) {
      const winner = await existingForRetry(member, body.id, vehicleId);
      if (winner) return { treatment: winner, created: false };
    }
    throw err;
  }
}

async function existingForRetry(member: MemberContext, id: string, vehicleId: string) {
  const row = await Treatment.findByPk(id, { attributes: ['id', 'workshopId', 'vehicleId'] });
  if (!row) return null;
  if (row.workshopId !== member.workshopId || row.vehicleId !== vehicleId) throw idTaken();
  await findVehicleFor(member, vehicleId);
  return withDetails(id);
}

const PLAN_INPUTS = ['appliedAt', 'targetAgent', 'method'] as const;

/**
 * A correction is a new version: the current data moves to treatment_versions with the reason
 * and who corrected it, then the record takes the corrected data. Pending re-checks follow the
 * corrected zones; when the date, agent or method changed, the ones still to come are planned
 * again (those already done stay as recorded).
 */
export async function correctTreatment(
  member: MemberContext,
  treatmentId: string,
  body: CorrectTreatment,
) {
  const id = await Treatment.sequelize!.transaction(async (transaction) => {
    const { treatment, vehicle } = await findTreatmentFor(member, treatmentId, {
      transaction,
      lock: true,
    });
    if (treatment.version !== body.version) throw staleVersion('treatment');
    const before = treatment.data;
    const after = dataOf(body, checkZones(vehicle, body.zoneKeys));
    const changed = diff(before, after, [
      ...new Set([...Object.keys(before), ...Object.keys(after)]),
    ]);
    if (Object.keys(changed).length === 0) return treatment.id;

    await TreatmentVersion.create(
      {
        treatmentId: treatment.id,
        version: treatment.version,
        data: before,
        reason: body.reason,
        changedById: member.userId,
      },
      { transaction },
    );
    treatment.set({
      data: after,
      appliedAt: new Date(after.appliedAt),
      zoneKeys: after.zoneKeys,
      method: after.method,
      targetAgent: after.targetAgent,
    });
    await treatment.save({ transaction });

    const replanned = PLAN_INPUTS.some((k) => k in changed);
    const rechecks = await ReCheck.findAll({
      where: { treatmentId: treatment.id },
      order: [['dueDate', 'ASC']],
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    const pending = rechecks.filter((r) => r.status === 'pending');
    if (replanned) {
      const settings = (await settingsOf(member.workshopId, transaction)).treatments;
      const dates = recheckDueDates(after.appliedAt, after.targetAgent, after.method, settings);
      const assigneeId = pending[0]?.assigneeId ?? null;
      await ReCheck.destroy({ where: { id: pending.map((r) => r.id) }, transaction });
      await ReCheck.bulkCreate(
        dates.slice(rechecks.length - pending.length).map((dueDate) => ({
          workshopId: member.workshopId,
          vehicleId: vehicle.id,
          treatmentId: treatment.id,
          zoneKeys: after.zoneKeys,
          dueDate,
          assigneeId,
        })),
        { transaction },
      );
    } else if ('zoneKeys' in changed) {
      // A static update skips the model's optimistic-lock bump, so it is made here as save() would.
      await ReCheck.update(
        { zoneKeys: after.zoneKeys, version: literal('version + 1') },
        { where: { id: pending.map((r) => r.id) }, transaction },
      );
    }

    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'treatment.correct',
      entityType: 'treatment',
      entityId: treatment.id,
      summary: `Corrected the treatment on ${describeVehicle(vehicle)} (version ${body.version} kept): ${Object.keys(changed).join(', ')}. Reason: ${body.reason}`,
      changes: { ...changed, reason: body.reason },
    });
    return treatment.id;
  });
  return withDetails(id);
}
