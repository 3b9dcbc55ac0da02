import { createEvent } from 'ics';
import type { Transaction, WhereOptions } from 'sequelize';
import type { z } from 'zod';
import { getBodyPlan, zoneLabel } from '@/shared/body-plans';
import { can } from '@/shared/roles';
import { addCalendarDays, localDate } from '@/shared/treatments';
import type {
  assignRecheckRequest,
  DueListQuery,
  DueListResponse,
  moveRecheckRequest,
  RecheckResponse,
  recordRecheckRequest,
} from '@/shared/schemas/recheck';
import { badRequest, conflict, notFound, staleVersion } from '../errors';
import type { MemberContext } from '../middleware/workshop';
import { Finding, Membership, ReCheck, Survey, User, Vehicle } from '../models';
import { audit } from './audit';
import {
  describeVehicle,
  findThroughVehicle,
  findVehicleFor,
  visibleVehiclesWhere,
  type FindRowOptions,
} from './vehicle-access';
import { settingsOf } from './workshops';

type RecordRecheck = z.output<typeof recordRecheckRequest>;
type MoveRecheck = z.output<typeof moveRecheckRequest>;
type AssignRecheck = z.output<typeof assignRecheckRequest>;

const PEOPLE = [
  { model: User, as: 'assignee', attributes: ['id', 'name'] },
  { model: User, as: 'completedBy', attributes: ['id', 'name'] },
];

export function toRecheckResponse(r: ReCheck, vehicle: Vehicle): RecheckResponse {
  return {
    id: r.id,
    vehicleId: r.vehicleId,
    treatmentId: r.treatmentId,
    zoneKeys: r.zoneKeys,
    dueDate: r.dueDate,
    assigneeId: r.assigneeId ?? null,
    assigneeName: r.assignee?.name ?? null,
    status: r.status,
    completedAt: r.completedAt ? r.completedAt.toISOString() : null,
    completedByName: r.completedBy?.name ?? null,
    frassCleaned: r.frassCleaned,
    notes: r.notes,
    findingId: r.findingId ?? null,
    moveReason: r.moveReason,
    version: r.version,
    vehicleLabel: describeVehicle(vehicle),
  };
}

async function withDetails(id: string, vehicle: Vehicle, transaction?: Transaction) {
  const row = await ReCheck.findByPk(id, { include: PEOPLE, transaction });
  if (!row) throw notFound('Re-check');
  return toRecheckResponse(row, vehicle);
}

/** A re-check and its vehicle, through the vehicle gate (404 for another workshop or an unshared client). */
async function findRecheckFor(member: MemberContext, recheckId: string, opts: FindRowOptions = {}) {
  const { row, vehicle } = await findThroughVehicle(ReCheck, 'Re-check', member, recheckId, opts);
  return { recheck: row, vehicle };
}

export async function listVehicleRechecks(member: MemberContext, vehicleId: string) {
  const vehicle = await findVehicleFor(member, vehicleId);
  const rows = await ReCheck.findAll({
    where: { vehicleId: vehicle.id },
    include: PEOPLE,
    order: [
      ['dueDate', 'ASC'],
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return rows.map((r) => toRecheckResponse(r, vehicle));
}

/**
 * Pending re-checks across the vehicles the caller can read, split into overdue (before today
 * in the workshop's time zone), due within `days` days from today, and later.
 */
export async function dueList(
  member: MemberContext,
  query: DueListQuery,
): Promise<DueListResponse> {
  const today = localDate(new Date(), (await settingsOf(member.workshopId)).treatments.timeZone);
  const windowEnd = addCalendarDays(today, query.days);
  const where: WhereOptions<ReCheck> = { workshopId: member.workshopId, status: 'pending' };
  if (query.assigneeId) Object.assign(where, { assigneeId: query.assigneeId });
  const rows = await ReCheck.findAll({
    where,
    include: [
      ...PEOPLE,
      { model: Vehicle, as: 'vehicle', required: true, where: visibleVehiclesWhere(member) },
    ],
    order: [
      ['dueDate', 'ASC'],
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  const out: DueListResponse = { overdue: [], thisWeek: [], upcoming: [] };
  for (const r of rows) {
    const item = toRecheckResponse(r, r.vehicle!);
    if (r.dueDate < today) out.overdue.push(item);
    else if (r.dueDate < windowEnd) out.thisWeek.push(item);
    else out.upcoming.push(item);
  }
  return out;
}

const alreadyDone = () => conflict('This re-check already has a result; it cannot change.');

function zoneLabels(vehicle: Vehicle, zoneKeys: string[]) {
  const plan = getBodyPlan(vehicle.bodyPlanKey);
  return zoneKeys.map((k) => zoneLabel(plan, k));
}

/** The vehicle's most recent survey: where fresh evidence from a re-check is logged. */
async function latestSurvey(vehicleId: string, transaction: Transaction) {
  return Survey.findOne({
    where: { vehicleId },
    order: [
      ['date', 'DESC'],
      ['createdAt', 'DESC'],
    ],
    transaction,
  });
}

/**
 * Records the result of a pending re-check. Fresh evidence is also logged as a finding (in the
 * vehicle's latest survey) so the zone reopens; a re-check with a result is not changed again.
 */
export async function recordResult(member: MemberContext, recheckId: string, body: RecordRecheck) {
  const { id, vehicle } = await ReCheck.sequelize!.transaction(async (transaction) => {
    const { recheck, vehicle } = await findRecheckFor(member, recheckId, {
      transaction,
      lock: true,
    });
    if (recheck.version !== body.version) throw staleVersion('re-check');
    if (recheck.status !== 'pending') throw alreadyDone();
    let findingId: string | null = null;
    if (body.result === 'fresh-evidence' && body.finding) {
      const f = body.finding;
      if (!recheck.zoneKeys.includes(f.zoneKey))
        throw badRequest({ 'finding.zoneKey': 'Choose one of the zones this re-check covers' });
      const survey = await latestSurvey(vehicle.id, transaction);
      if (!survey)
        throw badRequest({
          finding: 'This vehicle has no survey to log the finding in; start a survey first',
        });
      const finding = await Finding.create(
        {
          workshopId: member.workshopId,
          vehicleId: vehicle.id,
          surveyId: survey.id,
          authorId: member.userId,
          zoneKey: f.zoneKey,
          severity: f.severity,
          decayType: 'none',
          insectEvidence: f.insectEvidence,
          holeDiameterMm: null,
          activity: f.activity,
          moisture: null,
          pickTest: 'not-done',
          decayDepthMm: { top: 0, bottom: 0, left: 0, right: 0 },
          affectedLengthMm: null,
          atJointOrFitting: false,
          pin: null,
          notes: f.notes || `Found at the re-check due ${recheck.dueDate}`,
        },
        { transaction },
      );
      findingId = finding.id;
      await audit(transaction, {
        workshopId: member.workshopId,
        actorId: member.userId,
        action: 'finding.create',
        entityType: 'finding',
        entityId: finding.id,
        summary: `Logged fresh evidence (severity ${f.severity}) at ${f.zoneKey} on ${describeVehicle(vehicle)} during a re-check`,
      });
    }
    recheck.set({
      status: body.result,
      completedAt: new Date(),
      completedById: member.userId,
      frassCleaned: body.frassCleaned,
      notes: body.notes,
      findingId,
    });
    await recheck.save({ transaction });
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'recheck.record',
      entityType: 'recheck',
      entityId: recheck.id,
      summary: `Recorded the re-check due ${recheck.dueDate} of ${zoneLabels(vehicle, recheck.zoneKeys).join(', ')} on ${describeVehicle(vehicle)}: ${body.result === 'clean' ? 'clean' : 'fresh evidence'}`,
      changes: { status: { from: 'pending', to: body.result }, frassCleaned: body.frassCleaned },
    });
    return { id: recheck.id, vehicle };
  });
  return withDetails(id, vehicle);
}

/** Moves a pending re-check to another day; the reason is kept on it and in the audit trail. */
export async function moveRecheck(member: MemberContext, recheckId: string, body: MoveRecheck) {
  const { id, vehicle } = await ReCheck.sequelize!.transaction(async (transaction) => {
    const { recheck, vehicle } = await findRecheckFor(member, recheckId, {
      transaction,
      lock: true,
    });
    if (recheck.version !== body.version) throw staleVersion('re-check');
    if (recheck.status !== 'pending') throw alreadyDone();
    const from = recheck.dueDate;
    recheck.set({ dueDate: body.dueDate, moveReason: body.reason });
    await recheck.save({ transaction });
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'recheck.move',
      entityType: 'recheck',
      entityId: recheck.id,
      summary: `Moved a re-check on ${describeVehicle(vehicle)} from ${from} to ${body.dueDate}: ${body.reason}`,
      changes: { dueDate: { from, to: body.dueDate }, reason: body.reason },
    });
    return { id: recheck.id, vehicle };
  });
  return withDetails(id, vehicle);
}

/** Gives a re-check to a member who may record re-checks, or to nobody. */
export async function assignRecheck(member: MemberContext, recheckId: string, body: AssignRecheck) {
  const { id, vehicle } = await ReCheck.sequelize!.transaction(async (transaction) => {
    const { recheck, vehicle } = await findRecheckFor(member, recheckId, {
      transaction,
      lock: true,
    });
    if (recheck.version !== body.version) throw staleVersion('re-check');
    if (body.assigneeId) {
      const m = await Membership.findOne({
        where: { workshopId: member.workshopId, userId: body.assigneeId },
        transaction,
      });
      if (!m || !can(m.role, 'rechecks.write'))
        throw badRequest({ assigneeId: 'Choose a member of this workshop who records re-checks' });
    }
    const from = recheck.assigneeId ?? null;
    if (from === body.assigneeId) return { id: recheck.id, vehicle };
    recheck.set({ assigneeId: body.assigneeId });
    await recheck.save({ transaction });
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'recheck.assign',
      entityType: 'recheck',
      entityId: recheck.id,
      summary: `${body.assigneeId ? 'Assigned' : 'Unassigned'} the re-check due ${recheck.dueDate} on ${describeVehicle(vehicle)}`,
      changes: { assigneeId: { from, to: body.assigneeId } },
    });
    return { id: recheck.id, vehicle };
  });
  return withDetails(id, vehicle);
}

/** One all-day calendar event for the re-check's due date. */
export async function recheckCalendar(member: MemberContext, recheckId: string) {
  const { recheck, vehicle } = await findRecheckFor(member, recheckId);
  const [y, m, d] = recheck.dueDate.split('-').map(Number);
  const end = addCalendarDays(recheck.dueDate, 1).split('-').map(Number);
  const zones = zoneLabels(vehicle, recheck.zoneKeys).join(', ');
  const { error, value } = createEvent({
    productId: 'soundframe/re-checks',
    uid: `recheck-${recheck.id}@soundframe`,
    start: [y, m, d],
    end: [end[0], end[1], end[2]],
    title: `Re-check ${describeVehicle(vehicle)}: ${zones}`,
    description: `Look over ${zones} for fresh evidence (frass, new holes, live insects, spreading decay) and record the result in Soundframe.`,
    busyStatus: 'FREE',
    transp: 'TRANSPARENT',
  });
  if (error || !value) throw error ?? new Error('Calendar event could not be built');
  return { ics: value, filename: `recheck-${recheck.dueDate}.ics` };
}
