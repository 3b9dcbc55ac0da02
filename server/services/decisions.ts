import { Op, type Transaction } from 'sequelize';
import type { z } from 'zod';
import { getBodyPlan, getZone, type BodyPlan, type Zone } from '@/shared/body-plans';
import {
  decisionInputs,
  type DecisionInputs,
  type DecisionResponse,
  type saveDecisionRequest,
} from '@/shared/schemas/decision';
import {
  decisionFields,
  DomainError,
  VERDICT_OPTION_LABELS,
  type VerdictOption,
} from '@/shared/wood';
import { badRequest, notFound, staleVersion } from '../errors';
import type { MemberContext } from '../middleware/workshop';
import { Finding, MemberDecision, User, Workshop, type Vehicle } from '../models';
import { audit, diff, snapshot } from './audit';
import { describeVehicle, findVehicleFor } from './vehicle-access';
import { readSettings } from './workshops';

type SaveDecision = z.output<typeof saveDecisionRequest>;

const RECORDED = [
  'inputs',
  'recommendedOption',
  'recommendationReasons',
  'chosenOption',
  'overrideReason',
  'decisionClass',
  'estimatedHours',
  'labourCost',
  'materialCost',
  'totalCost',
  'materials',
  'splice',
  'notes',
] as const;

const REPLACING: VerdictOption[] = ['replace-member', 'replace-assembly'];

export function toDecisionResponse(d: MemberDecision): DecisionResponse {
  return {
    id: d.id,
    vehicleId: d.vehicleId,
    zoneKey: d.zoneKey,
    inputs: d.inputs,
    recommendedOption: d.recommendedOption,
    recommendationReasons: d.recommendationReasons,
    chosenOption: d.chosenOption,
    overrideReason: d.overrideReason,
    decisionClass: d.decisionClass,
    estimatedHours: d.estimatedHours,
    labourCost: d.labourCost,
    materialCost: d.materialCost,
    totalCost: d.totalCost,
    materials: d.materials,
    splice: d.splice,
    notes: d.notes,
    decidedById: d.decidedById,
    decidedByName: d.decidedBy?.name ?? null,
    version: d.version,
    createdAt: d.createdAt.toISOString(),
    updatedAt: d.updatedAt.toISOString(),
  };
}

function planZone(vehicle: Vehicle, zoneKey: string): { plan: BodyPlan; zone: Zone } | null {
  const plan = getBodyPlan(vehicle.bodyPlanKey);
  const zone = plan && getZone(plan, zoneKey);
  return plan && zone ? { plan, zone } : null;
}

async function withDetails(id: string, transaction?: Transaction) {
  const row = await MemberDecision.findByPk(id, {
    include: [{ model: User, as: 'decidedBy', attributes: ['id', 'name'] }],
    transaction,
  });
  if (!row) throw notFound('Decision');
  return toDecisionResponse(row);
}

/** Decisions for a vehicle's members, in zone-key order (readers incl. clients it is shared with). */
export async function listDecisions(member: MemberContext, vehicleId: string) {
  const vehicle = await findVehicleFor(member, vehicleId);
  const rows = await MemberDecision.findAll({
    where: { vehicleId: vehicle.id },
    include: [{ model: User, as: 'decidedBy', attributes: ['id', 'name'] }],
    order: [['zoneKey', 'ASC']],
  });
  return rows.map(toDecisionResponse);
}

export async function getDecision(member: MemberContext, vehicleId: string, zoneKey: string) {
  const vehicle = await findVehicleFor(member, vehicleId);
  const row = await MemberDecision.findOne({
    where: { vehicleId: vehicle.id, zoneKey },
    include: [{ model: User, as: 'decidedBy', attributes: ['id', 'name'] }],
  });
  if (!row) throw notFound('Decision');
  return toDecisionResponse(row);
}

/** What the zone's open (not deleted) findings say: the worst severity and whether anything is active. */
async function zoneEvidence(vehicleId: string, zoneKey: string, transaction: Transaction) {
  const findings = await Finding.findAll({
    where: { vehicleId, zoneKey },
    attributes: ['severity', 'activity'],
    transaction,
  });
  return {
    severity: Math.max(0, ...findings.map((f) => f.severity)),
    activeAgent: findings.some((f) => f.activity === 'active'),
  };
}

/** Other members of the zone's assembly whose decision is to replace them (or the assembly). */
async function assemblyReplacements(
  vehicleId: string,
  plan: BodyPlan,
  zone: Zone,
  transaction: Transaction,
) {
  if (!zone.assembly) return 0;
  const siblings = plan.zones
    .filter((z) => z.assembly === zone.assembly && z.key !== zone.key)
    .map((z) => z.key);
  if (siblings.length === 0) return 0;
  return MemberDecision.count({
    where: {
      vehicleId,
      zoneKey: { [Op.in]: siblings },
      chosenOption: { [Op.in]: REPLACING },
    },
    transaction,
  });
}

/** Request path of a domain function's parameter, so a 400 names the field the client sent. */
function requestField(domainField: string): string {
  const [head, ...rest] = domainField.split('.');
  if (head === 'width') return 'inputs.widthMm';
  if (head === 'depth') return 'inputs.depthMm';
  if (head === 'decay') return ['inputs.decayMm', ...rest].join('.');
  if (head in decisionInputs.shape) return `inputs.${domainField}`;
  return domainField;
}

function inRequestTerms<T>(compute: () => T): T {
  try {
    return compute();
  } catch (err) {
    if (err instanceof DomainError) throw badRequest({ [requestField(err.field)]: err.message });
    throw err;
  }
}

/**
 * Measurements the section functions would accept but that cannot be: decay from one face past
 * the opposite face, or more affected length than the member has.
 */
function checkMeasurements(inputs: DecisionInputs) {
  const errors: Record<string, string> = {};
  const across = {
    top: inputs.depthMm,
    bottom: inputs.depthMm,
    left: inputs.widthMm,
    right: inputs.widthMm,
  };
  for (const face of ['top', 'bottom', 'left', 'right'] as const)
    if (inputs.decayMm[face] > across[face])
      errors[`inputs.decayMm.${face}`] = `Deeper than the member (${across[face]} mm)`;
  if (inputs.affectedLengthMm > inputs.memberLengthMm)
    errors['inputs.affectedLengthMm'] = `Longer than the member (${inputs.memberLengthMm} mm)`;
  if (Object.keys(errors).length) throw badRequest(errors);
}

/**
 * Creates or replaces the decision for one member. The recommendation is always recomputed here
 * from the measured inputs, the zone on the body plan, its open findings, the other decisions of
 * its assembly and the workshop's rules and scarf slope, so what is stored is what the rules say. The vehicle row
 * is locked for the transaction: two saves for one vehicle run one after the other, so a second
 * save from the same version gets 409 and a first save for a zone cannot be made twice.
 */
export async function saveDecision(
  member: MemberContext,
  vehicleId: string,
  zoneKey: string,
  body: SaveDecision,
) {
  const { id, created } = await MemberDecision.sequelize!.transaction(async (transaction) => {
    const vehicle = await findVehicleFor(member, vehicleId, { transaction, lock: true });
    const placed = planZone(vehicle, zoneKey);
    if (!placed) throw badRequest({ zoneKey: 'Choose a zone of this vehicle’s body plan' });
    const { plan, zone } = placed;
    const existing = await MemberDecision.findOne({
      where: { vehicleId: vehicle.id, zoneKey },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (existing && body.version !== undefined && existing.version !== body.version)
      throw staleVersion('decision');

    const { inputs } = body;
    checkMeasurements(inputs);
    const workshop = await Workshop.findByPk(member.workshopId, { transaction });
    if (!workshop) throw notFound('Workshop');
    const settings = readSettings(workshop.settings);
    const evidence = await zoneEvidence(vehicle.id, zoneKey, transaction);
    const context = {
      structuralClass: zone.structuralClass,
      worstSeverity: evidence.severity,
      activeAgent: evidence.activeAgent,
      assemblyMembersNeedingReplacement: await assemblyReplacements(
        vehicle.id,
        plan,
        zone,
        transaction,
      ),
    };
    const computed = inRequestTerms(() =>
      decisionFields(zone, inputs, context, settings, {
        option: body.chosenOption,
        reason: body.overrideReason,
      }),
    );
    const overridden = computed.chosenOption !== computed.recommendedOption;

    const errors: Record<string, string> = {};
    if (existing && body.version === undefined)
      errors.version = 'Send the version of the decision you loaded';
    if (overridden && !body.overrideReason) errors.overrideReason = 'Say why you chose differently';
    if (Object.keys(errors).length) throw badRequest(errors);

    const fields = { ...computed, notes: body.notes };
    const chosenWords = VERDICT_OPTION_LABELS[body.chosenOption].toLowerCase();
    const what = `${zone.label} on ${describeVehicle(vehicle)}: ${chosenWords}${
      overridden
        ? ` (recommended: ${VERDICT_OPTION_LABELS[computed.recommendedOption].toLowerCase()})`
        : ''
    }`;

    if (!existing) {
      const row = await MemberDecision.create(
        {
          ...fields,
          workshopId: member.workshopId,
          vehicleId: vehicle.id,
          zoneKey,
          decidedById: member.userId,
        },
        { transaction },
      );
      await audit(transaction, {
        workshopId: member.workshopId,
        actorId: member.userId,
        action: 'decision.create',
        entityType: 'decision',
        entityId: row.id,
        summary: `Decided ${what}`,
        changes: diff(blank(), snapshot(row, RECORDED), [...RECORDED]),
      });
      return { id: row.id, created: true };
    }

    const before = snapshot(existing, RECORDED);
    existing.set({ ...fields, decidedById: member.userId });
    // Decimals are compared as they will be stored, so an unchanged save is not a change.
    const changed = diff(before, roundedSnapshot(existing), [...RECORDED]);
    if (Object.keys(changed).length === 0) return { id: existing.id, created: false };
    await existing.save({ transaction });
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'decision.update',
      entityType: 'decision',
      entityId: existing.id,
      summary: `Changed the decision for ${what}; ${Object.keys(changed).join(', ')}`,
      changes: changed,
    });
    return { id: existing.id, created: false };
  });
  return { decision: await withDetails(id), created };
}

const blank = () => Object.fromEntries(RECORDED.map((k) => [k, null]));

const DECIMALS = ['estimatedHours', 'labourCost', 'materialCost', 'totalCost'] as const;
function roundedSnapshot(row: MemberDecision) {
  const s = snapshot(row, RECORDED);
  for (const k of DECIMALS) s[k] = Math.round(Number(s[k]) * 100) / 100;
  return s;
}

/**
 * Removes the member's decision (a hard delete: the audit entry keeps every recorded field, and
 * the next save starts a new record at version 0).
 */
export async function deleteDecision(member: MemberContext, vehicleId: string, zoneKey: string) {
  await MemberDecision.sequelize!.transaction(async (transaction) => {
    const vehicle = await findVehicleFor(member, vehicleId, { transaction, lock: true });
    const row = await MemberDecision.findOne({
      where: { vehicleId: vehicle.id, zoneKey },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!row) throw notFound('Decision');
    const label = planZone(vehicle, zoneKey)?.zone.label ?? zoneKey;
    await row.destroy({ transaction });
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'decision.delete',
      entityType: 'decision',
      entityId: row.id,
      summary: `Removed the decision for ${label} on ${describeVehicle(vehicle)}`,
      changes: diff(snapshot(row, RECORDED), blank(), [...RECORDED]),
    });
  });
}
