import { literal, UniqueConstraintError, type Transaction } from 'sequelize';
import type { z } from 'zod';
import { getBodyPlan } from '@/shared/body-plans';
import type {
  createSurveyRequest,
  SurveyResponse,
  updateSurveyRequest,
} from '@/shared/schemas/survey';
import { badRequest, notFound } from '../errors';
import type { MemberContext } from '../middleware/workshop';
import { Survey, User, type Vehicle } from '../models';
import { audit, diff, snapshot } from './audit';
import {
  describeVehicle,
  findThroughVehicle,
  findVehicleFor,
  type FindRowOptions,
} from './vehicle-access';
import { idTaken } from './vehicles';

type CreateSurvey = z.output<typeof createSurveyRequest>;
type UpdateSurvey = z.output<typeof updateSurveyRequest>;

const EDITABLE = [
  'date',
  'purpose',
  'airTempC',
  'relativeHumidity',
  'notAccessibleZones',
  'notAccessibleNotes',
  'notes',
] as const;

const FINDING_COUNT: [ReturnType<typeof literal>, string] = [
  literal(
    '(SELECT COUNT(*) FROM findings f WHERE f.survey_id = `Survey`.`id` AND f.deleted_at IS NULL)',
  ),
  'findingCount',
];

export function toSurveyResponse(s: Survey): SurveyResponse {
  return {
    id: s.id,
    vehicleId: s.vehicleId,
    date: s.date,
    purpose: s.purpose,
    airTempC: s.airTempC,
    relativeHumidity: s.relativeHumidity,
    notAccessibleZones: s.notAccessibleZones,
    notAccessibleNotes: s.notAccessibleNotes,
    notes: s.notes,
    inspectorId: s.inspectorId ?? null,
    inspectorName: s.inspector?.name ?? null,
    findingCount: Number(s.get('findingCount') ?? 0),
    createdAt: s.createdAt.toISOString(),
  };
}

/** A survey and its vehicle, through the vehicle gate (404 for another workshop or an unshared client). */
export async function findSurveyFor(
  member: MemberContext,
  surveyId: string,
  opts: FindRowOptions = {},
) {
  const { row, vehicle } = await findThroughVehicle(Survey, 'Survey', member, surveyId, opts);
  return { survey: row, vehicle };
}

/** Areas marked not accessible must be zones of the vehicle's body plan; free text goes in the notes. */
function checkZones(vehicle: Vehicle, zones: string[] | undefined): string[] | undefined {
  if (!zones) return zones;
  const plan = getBodyPlan(vehicle.bodyPlanKey);
  const known = new Set(plan?.zones.map((z) => z.key) ?? []);
  const unknown = zones.filter((z) => !known.has(z));
  if (unknown.length)
    throw badRequest({
      notAccessibleZones: `Not zones of this body plan: ${unknown.slice(0, 5).join(', ')}`,
    });
  return [...new Set(zones)];
}

async function withDetails(id: string, transaction?: Transaction) {
  const row = await Survey.findOne({
    where: { id },
    attributes: { include: [FINDING_COUNT] },
    include: [{ model: User, as: 'inspector', attributes: ['id', 'name'] }],
    transaction,
  });
  if (!row) throw notFound('Survey');
  return toSurveyResponse(row);
}

export async function listSurveys(member: MemberContext, vehicleId: string) {
  const vehicle = await findVehicleFor(member, vehicleId);
  const rows = await Survey.findAll({
    where: { vehicleId: vehicle.id },
    attributes: { include: [FINDING_COUNT] },
    include: [{ model: User, as: 'inspector', attributes: ['id', 'name'] }],
    order: [
      ['date', 'DESC'],
      ['createdAt', 'DESC'],
      ['id', 'ASC'],
    ],
  });
  return rows.map(toSurveyResponse);
}

/** Starts a survey with the caller as inspector. A retried request with the same `id` returns the first one's row. */
export async function createSurvey(member: MemberContext, vehicleId: string, body: CreateSurvey) {
  const vehicle = await findVehicleFor(member, vehicleId);
  const notAccessibleZones = checkZones(vehicle, body.notAccessibleZones) ?? [];
  const existing = body.id ? await existingForRetry(member, body.id, vehicle.id) : null;
  if (existing) return { survey: existing, created: false };
  try {
    const id = await Survey.sequelize!.transaction(async (transaction) => {
      const { id: clientId, ...fields } = body;
      const survey = await Survey.create(
        {
          ...(clientId ? { id: clientId } : {}),
          ...fields,
          notAccessibleZones,
          workshopId: member.workshopId,
          vehicleId: vehicle.id,
          inspectorId: member.userId,
        },
        { transaction },
      );
      await audit(transaction, {
        workshopId: member.workshopId,
        actorId: member.userId,
        action: 'survey.create',
        entityType: 'survey',
        entityId: survey.id,
        summary: `Started a ${survey.purpose} survey of ${describeVehicle(vehicle)} dated ${survey.date}`,
      });
      return survey.id;
    });
    return { survey: await withDetails(id), created: true };
  } catch (err) {
    if (err instanceof UniqueConstraintError && body.id) {
      const winner = await existingForRetry(member, body.id, vehicle.id);
      if (winner) return { survey: winner, created: false };
    }
    throw err;
  }
}

async function existingForRetry(member: MemberContext, id: string, vehicleId: string) {
  const row = await Survey.findOne({
    where: { id },
    attributes: ['id', 'workshopId', 'vehicleId'],
  });
  if (!row) return null;
  if (row.workshopId !== member.workshopId || row.vehicleId !== vehicleId) throw idTaken();
  return withDetails(id);
}

export async function updateSurvey(member: MemberContext, surveyId: string, body: UpdateSurvey) {
  const id = await Survey.sequelize!.transaction(async (transaction) => {
    const { survey, vehicle } = await findSurveyFor(member, surveyId, { transaction, lock: true });
    const changes = { ...body, notAccessibleZones: checkZones(vehicle, body.notAccessibleZones) };
    if (changes.notAccessibleZones === undefined) delete changes.notAccessibleZones;
    const before = snapshot(survey, EDITABLE);
    survey.set(changes);
    const changed = diff(before, snapshot(survey, EDITABLE), [...EDITABLE]);
    if (Object.keys(changed).length === 0) return survey.id;
    await survey.save({ transaction });
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'survey.update',
      entityType: 'survey',
      entityId: survey.id,
      summary: `Edited the survey of ${describeVehicle(vehicle)} dated ${survey.date}: ${Object.keys(changed).join(', ')}`,
      changes: changed,
    });
    return survey.id;
  });
  return withDetails(id);
}
