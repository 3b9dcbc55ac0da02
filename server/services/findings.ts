import {
  Op,
  UniqueConstraintError,
  type Includeable,
  type Order,
  type Transaction,
  type WhereOptions,
} from 'sequelize';
import type { z } from 'zod';
import { getBodyPlan, getZone } from '@/shared/body-plans';
import { can } from '@/shared/roles';
import type {
  createFindingRequest,
  FindingResponse,
  findingListQuery,
  PhotoResponse,
  updateFindingRequest,
} from '@/shared/schemas/finding';
import { badRequest, forbidden, notFound, staleVersion } from '../errors';
import type { MemberContext } from '../middleware/workshop';
import { Finding, Photo, Survey, User, type Vehicle } from '../models';
import { audit, diff, snapshot } from './audit';
import {
  describeVehicle,
  findThroughVehicle,
  findVehicleFor,
  type FindVehicleOptions,
} from './vehicle-access';
import { findSurveyFor } from './surveys';
import { idTaken } from './vehicles';

type CreateFinding = z.output<typeof createFindingRequest>;
type UpdateFinding = z.output<typeof updateFindingRequest>;
type FindingListQuery = z.output<typeof findingListQuery>;

const EDITABLE = [
  'zoneKey',
  'severity',
  'decayType',
  'insectEvidence',
  'holeDiameterMm',
  'activity',
  'moisture',
  'pickTest',
  'decayDepthMm',
  'affectedLengthMm',
  'atJointOrFitting',
  'pin',
  'notes',
] as const;

/** Photos are served only through the authorized rendition routes, never from a static path. */
export function toPhotoResponse(p: Photo): PhotoResponse {
  const base = `/api/workshops/${p.workshopId}/photos/${p.id}`;
  return {
    id: p.id,
    findingId: p.findingId,
    width: p.width,
    height: p.height,
    thumbUrl: `${base}/thumb`,
    displayUrl: `${base}/display`,
    caption: p.caption,
    createdAt: p.createdAt.toISOString(),
  };
}

export function toFindingResponse(f: Finding): FindingResponse {
  return {
    id: f.id,
    surveyId: f.surveyId,
    vehicleId: f.vehicleId,
    surveyDate: f.survey?.date ?? '',
    zoneKey: f.zoneKey,
    severity: f.severity,
    decayType: f.decayType,
    insectEvidence: f.insectEvidence,
    holeDiameterMm: f.holeDiameterMm,
    activity: f.activity,
    moisture: f.moisture,
    pickTest: f.pickTest,
    decayDepthMm: f.decayDepthMm,
    affectedLengthMm: f.affectedLengthMm,
    atJointOrFitting: f.atJointOrFitting,
    pin: f.pin,
    notes: f.notes,
    photos: [...(f.photos ?? [])]
      .sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime() || a.id.localeCompare(b.id))
      .map(toPhotoResponse),
    authorName: f.author?.name ?? null,
    version: f.version,
    createdAt: f.createdAt.toISOString(),
    updatedAt: f.updatedAt.toISOString(),
    deletedAt: f.deletedAt ? f.deletedAt.toISOString() : null,
  };
}

const DETAILS: Includeable[] = [
  { model: Photo, as: 'photos' },
  { model: Survey, as: 'survey', attributes: ['id', 'date'] },
  { model: User, as: 'author', attributes: ['id', 'name'] },
];

/** Deleted findings are shown (and reopened) only to those who may write findings. */
const seesDeleted = (member: MemberContext) => can(member.role, 'findings.write');

/** A finding and its vehicle, through the vehicle gate (404 for another workshop or an unshared client). */
export async function findFindingFor(
  member: MemberContext,
  findingId: string,
  { includeDeleted, ...opts }: FindVehicleOptions = {},
): Promise<{ finding: Finding; vehicle: Vehicle }> {
  const { row, vehicle } = await findThroughVehicle(Finding, 'Finding', member, findingId, {
    ...opts,
    paranoid: !(includeDeleted && seesDeleted(member)),
  });
  return { finding: row, vehicle };
}

/** The zone must be on the vehicle's body plan, and a pin must sit inside one of its views. */
function checkPlacement(
  vehicle: Vehicle,
  fields: { zoneKey?: string; pin?: CreateFinding['pin'] },
) {
  const plan = getBodyPlan(vehicle.bodyPlanKey);
  const errors: Record<string, string> = {};
  if (fields.zoneKey !== undefined && !(plan && getZone(plan, fields.zoneKey)))
    errors.zoneKey = 'Choose a zone of this vehicle’s body plan';
  if (fields.pin) {
    const view = plan?.views.find((v) => v.key === fields.pin!.view);
    if (!view) errors['pin.view'] = 'Choose a view of this vehicle’s body plan';
    else {
      if (fields.pin.x < 0 || fields.pin.x > view.width)
        errors['pin.x'] = 'The pin is outside the drawing';
      if (fields.pin.y < 0 || fields.pin.y > view.height)
        errors['pin.y'] = 'The pin is outside the drawing';
    }
  }
  if (Object.keys(errors).length) throw badRequest(errors);
}

async function withDetails(id: string, transaction?: Transaction): Promise<FindingResponse> {
  const row = await Finding.findOne({
    where: { id },
    include: DETAILS,
    paranoid: false,
    transaction,
  });
  if (!row) throw notFound('Finding');
  return toFindingResponse(row);
}

export async function listFindings(
  member: MemberContext,
  vehicleId: string,
  query: FindingListQuery,
) {
  if (query.deleted && !seesDeleted(member))
    throw forbidden('Your role cannot see deleted findings.');
  const vehicle = await findVehicleFor(member, vehicleId);
  const where: WhereOptions<Finding>[] = [{ vehicleId: vehicle.id }];
  if (query.zone) where.push({ zoneKey: query.zone });
  if (query.surveyId) where.push({ surveyId: query.surveyId });
  if (query.deleted === 'only') where.push({ deletedAt: { [Op.ne]: null } });
  const order: Order = [
    [{ model: Survey, as: 'survey' }, 'date', 'DESC'],
    ['createdAt', 'DESC'],
    ['id', 'ASC'],
  ];
  const rows = await Finding.findAll({
    where: { [Op.and]: where },
    include: DETAILS,
    paranoid: !query.deleted,
    order,
  });
  return rows.map(toFindingResponse);
}

export async function getFinding(member: MemberContext, findingId: string) {
  const { finding } = await findFindingFor(member, findingId, { includeDeleted: true });
  return withDetails(finding.id);
}

/** Logs a finding on a survey, with the caller as author. A retried request with the same `id` returns the first one's row. */
export async function createFinding(member: MemberContext, surveyId: string, body: CreateFinding) {
  const { survey, vehicle } = await findSurveyFor(member, surveyId);
  checkPlacement(vehicle, body);
  const existing = body.id ? await existingForRetry(member, body.id, survey.id) : null;
  if (existing) return { finding: existing, created: false };
  try {
    const id = await Finding.sequelize!.transaction(async (transaction) => {
      const { id: clientId, ...fields } = body;
      const finding = await Finding.create(
        {
          ...(clientId ? { id: clientId } : {}),
          ...fields,
          workshopId: member.workshopId,
          vehicleId: vehicle.id,
          surveyId: survey.id,
          authorId: member.userId,
        },
        { transaction },
      );
      await audit(transaction, {
        workshopId: member.workshopId,
        actorId: member.userId,
        action: 'finding.create',
        entityType: 'finding',
        entityId: finding.id,
        summary: `Logged severity ${finding.severity} at ${finding.zoneKey} on ${describeVehicle(vehicle)}`,
      });
      return finding.id;
    });
    return { finding: await withDetails(id), created: true };
  } catch (err) {
    if (err instanceof UniqueConstraintError && body.id) {
      const winner = await existingForRetry(member, body.id, survey.id);
      if (winner) return { finding: winner, created: false };
    }
    throw err;
  }
}

async function existingForRetry(member: MemberContext, id: string, surveyId: string) {
  const row = await Finding.findOne({
    where: { id },
    attributes: ['id', 'workshopId', 'surveyId'],
    paranoid: false,
  });
  if (!row) return null;
  if (row.workshopId !== member.workshopId || row.surveyId !== surveyId) throw idTaken();
  return withDetails(id);
}

/**
 * Applies an edit made against `version`. The row lock makes a concurrent edit wait; it then sees
 * the new version and gets 409, so the first writer's values are never overwritten.
 */
export async function updateFinding(member: MemberContext, findingId: string, body: UpdateFinding) {
  const { version, ...changes } = body;
  const id = await Finding.sequelize!.transaction(async (transaction) => {
    const { finding, vehicle } = await findFindingFor(member, findingId, {
      transaction,
      lock: true,
    });
    if (finding.version !== version) throw staleVersion('finding');
    checkPlacement(vehicle, changes);
    const before = snapshot(finding, EDITABLE);
    finding.set(changes);
    const changed = diff(before, snapshot(finding, EDITABLE), [...EDITABLE]);
    if (Object.keys(changed).length === 0) return finding.id;
    await finding.save({ transaction });
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'finding.update',
      entityType: 'finding',
      entityId: finding.id,
      summary: `Edited the ${finding.zoneKey} finding on ${describeVehicle(vehicle)}: ${Object.keys(changed).join(', ')}`,
      changes: changed,
    });
    return finding.id;
  });
  return withDetails(id);
}

export async function deleteFinding(member: MemberContext, findingId: string) {
  await Finding.sequelize!.transaction(async (transaction) => {
    const { finding, vehicle } = await findFindingFor(member, findingId, {
      transaction,
      lock: true,
    });
    await finding.destroy({ transaction });
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'finding.delete',
      entityType: 'finding',
      entityId: finding.id,
      summary: `Deleted the ${finding.zoneKey} finding on ${describeVehicle(vehicle)}`,
    });
  });
}

/** Brings a soft-deleted finding back; restoring one that is not deleted changes nothing. */
export async function restoreFinding(member: MemberContext, findingId: string) {
  const id = await Finding.sequelize!.transaction(async (transaction) => {
    const { finding, vehicle } = await findFindingFor(member, findingId, {
      transaction,
      lock: true,
      includeDeleted: true,
    });
    if (finding.deletedAt) {
      await finding.restore({ transaction });
      await audit(transaction, {
        workshopId: member.workshopId,
        actorId: member.userId,
        action: 'finding.restore',
        entityType: 'finding',
        entityId: finding.id,
        summary: `Restored the ${finding.zoneKey} finding on ${describeVehicle(vehicle)}`,
      });
    }
    return finding.id;
  });
  return withDetails(id);
}
