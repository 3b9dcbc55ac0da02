import type { Transaction } from 'sequelize';
import { getZone, type BodyPlan, type Zone } from '@/shared/body-plans';
import type { Role } from '@/shared/roles';
import type { DecisionInputs } from '@/shared/schemas/decision';
import { treatmentData, type TreatmentData } from '@/shared/schemas/treatment';
import type { WorkshopSettings } from '@/shared/schemas/workshop';
import { recheckDueDates } from '@/shared/treatments';
import { decisionFields, type VerdictOption } from '@/shared/wood';
import { Finding, MemberDecision, ReCheck, Treatment, type User, type Vehicle } from '../models';

/**
 * The demo tourer's repair decisions and its beetle treatment: what the reports are drawn
 * from. Decisions are computed with the functions the decisions service uses, so the stored
 * numbers are the ones a save through the API would store. Product, registration and licence
 * numbers are invented.
 */
export interface DemoDecision {
  zoneKey: string;
  /** An option other than the recommendation, with the reason the service requires. */
  override?: { option: VerdictOption; reason: string };
  notes: string;
}

export interface DemoTreatment {
  zoneKeys: string[];
  /** Days before the seed runs (at least a day after the survey). */
  daysAgo: number;
  /** How many of the planned re-checks, soonest first, were done and clean. */
  cleanRechecks: number;
  data: Omit<TreatmentData, 'appliedAt' | 'zoneKeys'>;
}

export interface DemoWork {
  decisions: DemoDecision[];
  treatment: DemoTreatment | null;
}

export const ALDERMOOR_WORK: DemoWork = {
  decisions: [
    {
      zoneKey: 'hinge-pillar-front-left',
      notes: 'Make the new pillar with the tenon for the sill and re-bore the hinge screws.',
    },
    { zoneKey: 'sill-right', notes: 'Splice in new oak under the rear door opening.' },
    { zoneKey: 'cross-member-centre', notes: 'Check the right sill seat when the floor is up.' },
    { zoneKey: 'tonneau-rail-left', notes: 'Harden the top face before the trim goes back.' },
    { zoneKey: 'tonneau-rail-rear', notes: 'Short splice at the centre of the rail.' },
    {
      zoneKey: 'tonneau-rail-right',
      override: {
        option: 'keep',
        reason:
          'Treated for beetle: keep the rail as it is and watch it through the re-checks before any repair.',
      },
      notes: '',
    },
  ],
  treatment: {
    zoneKeys: ['tonneau-rail-right'],
    daysAgo: 30,
    cleanRechecks: 1,
    data: treatmentData.omit({ appliedAt: true, zoneKeys: true }).parse({
      applicatorName: 'Priya Halloran',
      licenceNumber: 'WCA-7731-DEMO',
      productName: 'Tarnbrook Borate Gel 10',
      registrationNumber: 'TBG-20817-DEMO',
      activeIngredient: 'Disodium octaborate tetrahydrate',
      concentration: '10 % w/w',
      formulation: 'Ready-to-use gel',
      dilution: 'Used neat, as the label directs',
      method: 'brush',
      targetAgent: 'lyctid-beetles',
      quantity: { amount: 0.6, unit: 'L' },
      areaTreated: 'Right tonneau rail, top and inner faces, about 1.2 m',
      ventilation: 'Bay doors open, extractor running',
      reentryHours: 12,
      ppe: ['Nitrile gloves', 'Safety glasses', 'Long sleeves'],
      conditions: { airTempC: 14, woodMoisturePercent: 15 },
      notes: 'Old frass brushed off and a card taped under the rail before treating.',
    }),
  },
};

/** Measured inputs from the zone's worst finding and its nominal section. */
export function demoInputs(zone: Zone, findings: Finding[]): DecisionInputs {
  const worst = findings.reduce<Finding | null>(
    (a, b) => (a && a.severity >= b.severity ? a : b),
    null,
  );
  return {
    widthMm: zone.nominalSection.widthMm,
    depthMm: zone.nominalSection.depthMm,
    decayMm: { top: 0, bottom: 0, left: 0, right: 0, ...worst?.decayDepthMm },
    affectedLengthMm: worst?.affectedLengthMm ?? 0,
    memberLengthMm: zone.lengthMm,
    atJointOrFitting: worst?.atJointOrFitting ?? false,
    species: zone.defaultSpecies,
  };
}

type Note = (
  action: string,
  entityType: string,
  entityId: string,
  summary: string,
  actor: User,
) => Promise<unknown>;

const DAY_MS = 24 * 60 * 60 * 1000;
const REPLACING: VerdictOption[] = ['replace-member', 'replace-assembly'];

export async function seedDemoWork(
  transaction: Transaction,
  ctx: {
    work: DemoWork;
    plan: BodyPlan;
    vehicle: Vehicle;
    findings: Finding[];
    settings: WorkshopSettings;
    people: Record<Role, User>;
    surveyRecordedAt: Date;
    note: Note;
    now?: Date;
  },
) {
  const { work, plan, vehicle, findings, settings, people, note } = ctx;
  const saved: { zone: Zone; option: VerdictOption }[] = [];
  for (const d of work.decisions) {
    const zone = getZone(plan, d.zoneKey);
    if (!zone) throw new Error(`Demo seed: body plan ${plan.key} has no zone ${d.zoneKey}`);
    const mine = findings.filter((f) => f.zoneKey === zone.key);
    const fields = decisionFields(
      zone,
      demoInputs(zone, mine),
      {
        structuralClass: zone.structuralClass,
        worstSeverity: Math.max(0, ...mine.map((f) => f.severity)),
        activeAgent: mine.some((f) => f.activity === 'active'),
        // As the service counts them: earlier decisions of the same assembly that replace.
        assemblyMembersNeedingReplacement: zone.assembly
          ? saved.filter((s) => s.zone.assembly === zone.assembly && REPLACING.includes(s.option))
              .length
          : 0,
      },
      settings,
      d.override ?? null,
    );
    const row = await MemberDecision.create(
      {
        ...fields,
        notes: d.notes,
        workshopId: vehicle.workshopId,
        vehicleId: vehicle.id,
        zoneKey: zone.key,
        decidedById: people.inspector.id,
      },
      { transaction },
    );
    saved.push({ zone, option: fields.chosenOption });
    await note(
      'decision.create',
      'decision',
      row.id,
      `Decided ${zone.label}: ${fields.chosenOption}`,
      people.inspector,
    );
  }
  if (work.treatment) await seedTreatment(transaction, work.treatment, ctx);
}

async function seedTreatment(
  transaction: Transaction,
  spec: DemoTreatment,
  ctx: Parameters<typeof seedDemoWork>[1],
) {
  const { vehicle, settings, people, note } = ctx;
  const now = ctx.now ?? new Date();
  // Relative to today so the demo stays current, but never before the survey it answers.
  const appliedAt = new Date(
    Math.max(now.getTime() - spec.daysAgo * DAY_MS, ctx.surveyRecordedAt.getTime() + DAY_MS),
  );
  const data = treatmentData.parse({
    ...spec.data,
    appliedAt: appliedAt.toISOString(),
    zoneKeys: spec.zoneKeys,
  });
  const treatment = await Treatment.create(
    {
      workshopId: vehicle.workshopId,
      vehicleId: vehicle.id,
      recordedById: people.applicator.id,
      data,
      appliedAt,
      zoneKeys: data.zoneKeys,
      method: data.method,
      targetAgent: data.targetAgent,
      createdAt: appliedAt,
      updatedAt: appliedAt,
    },
    { transaction },
  );
  await note(
    'treatment.create',
    'treatment',
    treatment.id,
    `Recorded a treatment (${data.productName}) on ${vehicle.make} ${vehicle.model}`,
    people.applicator,
  );
  const dueDates = recheckDueDates(
    data.appliedAt,
    data.targetAgent,
    data.method,
    settings.treatments,
  );
  for (const [i, dueDate] of dueDates.entries()) {
    const checkedAt = new Date(`${dueDate}T11:00:00Z`);
    const done = i < spec.cleanRechecks && checkedAt <= now;
    const completedAt = done ? checkedAt : null;
    const recheck = await ReCheck.create(
      {
        workshopId: vehicle.workshopId,
        vehicleId: vehicle.id,
        treatmentId: treatment.id,
        zoneKeys: data.zoneKeys,
        dueDate,
        assigneeId: people.applicator.id,
        ...(done
          ? {
              status: 'clean' as const,
              completedAt,
              completedById: people.applicator.id,
              frassCleaned: true,
              notes: 'No new powder on the card; rail top brushed clean.',
            }
          : {}),
      },
      { transaction },
    );
    if (done)
      await note(
        'recheck.record',
        'recheck',
        recheck.id,
        `Recorded a clean re-check due ${dueDate}`,
        people.applicator,
      );
  }
}
