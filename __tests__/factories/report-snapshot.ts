import crypto from 'node:crypto';
import { getBodyPlan, getZone, type BodyPlan } from '@/shared/body-plans';
import type { ReportSnapshot } from '@/shared/reports';
import type { DecisionResponse } from '@/shared/schemas/decision';
import type { FindingResponse } from '@/shared/schemas/finding';
import type { RecheckResponse, ZoneState, ZoneStateResponse } from '@/shared/schemas/recheck';
import type { SurveyResponse } from '@/shared/schemas/survey';
import type { TreatmentResponse } from '@/shared/schemas/treatment';
import { workshopSettings, type WorkshopSettings } from '@/shared/schemas/workshop';
import { recheckDueDates, zoneStateItems } from '@/shared/treatments';
import { decisionFields, type DecisionClass, type VerdictOption } from '@/shared/wood';

const id = () => crypto.randomUUID();
const AT = '2026-11-20T10:00:00.000Z';

export const REPORT_PLAN_KEY = 'open-tourer-4d';
export function reportPlan(key = REPORT_PLAN_KEY): BodyPlan {
  const plan = getBodyPlan(key);
  if (!plan) throw new Error(`No body plan ${key}`);
  return plan;
}

export type FindingSpec = Partial<Omit<FindingResponse, 'zoneKey'>> & { zoneKey: string };

export function buildFinding(spec: FindingSpec): FindingResponse {
  return {
    id: id(),
    surveyId: 'survey',
    vehicleId: 'vehicle',
    surveyDate: '2026-11-02',
    severity: 2,
    decayType: 'brown-rot',
    insectEvidence: [],
    holeDiameterMm: null,
    activity: 'unknown',
    moisture: null,
    pickTest: 'not-done',
    decayDepthMm: { top: 0, bottom: 0, left: 0, right: 0 },
    affectedLengthMm: null,
    atJointOrFitting: false,
    pin: null,
    notes: '',
    photos: [],
    authorName: 'Test Inspector',
    version: 0,
    createdAt: AT,
    updatedAt: AT,
    deletedAt: null,
    ...spec,
  };
}

/** A decision measured on the zone's nominal section; decay as a share of the depth from the bottom face. */
export type DecisionSpec = {
  zoneKey: string;
  decayShare?: number;
  affectedShare?: number;
  atJointOrFitting?: boolean;
  chosenOption?: VerdictOption;
  overrideReason?: string;
  /** Forces the class (for tests of the model, not of the verdict). */
  decisionClass?: DecisionClass;
};

/** Computes a decision the way the server does (decisionFields). */
export function buildDecision(
  plan: BodyPlan,
  spec: DecisionSpec,
  findings: FindingResponse[],
  settings: WorkshopSettings,
): DecisionResponse {
  const zone = getZone(plan, spec.zoneKey);
  if (!zone) throw new Error(`No zone ${spec.zoneKey}`);
  const { widthMm, depthMm } = zone.nominalSection;
  const inputs = {
    widthMm,
    depthMm,
    decayMm: { top: 0, bottom: depthMm * (spec.decayShare ?? 0.3), left: 0, right: 0 },
    affectedLengthMm: zone.lengthMm * (spec.affectedShare ?? 0.2),
    memberLengthMm: zone.lengthMm,
    atJointOrFitting: spec.atJointOrFitting ?? false,
    species: zone.defaultSpecies,
  };
  const mine = findings.filter((f) => f.zoneKey === zone.key);
  const fields = decisionFields(
    zone,
    inputs,
    {
      structuralClass: zone.structuralClass,
      worstSeverity: Math.max(0, ...mine.map((f) => f.severity)),
      activeAgent: mine.some((f) => f.activity === 'active'),
      assemblyMembersNeedingReplacement: 0,
    },
    settings,
    spec.chosenOption
      ? { option: spec.chosenOption, reason: spec.overrideReason ?? 'Owner’s choice' }
      : null,
  );
  return {
    id: id(),
    vehicleId: 'vehicle',
    zoneKey: zone.key,
    ...fields,
    decisionClass: spec.decisionClass ?? fields.decisionClass,
    notes: '',
    decidedById: null,
    decidedByName: 'Test Inspector',
    version: 0,
    createdAt: AT,
    updatedAt: AT,
  };
}

export function buildSurvey(partial: Partial<SurveyResponse> = {}): SurveyResponse {
  return {
    id: id(),
    vehicleId: 'vehicle',
    date: '2026-11-02',
    purpose: 'baseline',
    airTempC: 16,
    relativeHumidity: 60,
    notAccessibleZones: [],
    notAccessibleNotes: '',
    notes: '',
    inspectorId: null,
    inspectorName: 'Test Inspector',
    findingCount: 0,
    createdAt: AT,
    ...partial,
  };
}

export function buildTreatment(
  zoneKeys: string[],
  partial: Partial<TreatmentResponse> = {},
): TreatmentResponse {
  return {
    id: id(),
    vehicleId: 'vehicle',
    appliedAt: '2026-11-05T09:00:00.000Z',
    applicatorName: 'Test Applicator',
    licenceNumber: 'TL-0001',
    productName: 'Invented Borate Gel',
    registrationNumber: 'REG-TEST-1',
    activeIngredient: 'Disodium octaborate tetrahydrate',
    concentration: '10 %',
    formulation: 'Gel',
    dilution: '',
    method: 'brush',
    targetAgent: 'anobiid-beetles',
    zoneKeys,
    quantity: { amount: 1.5, unit: 'L' },
    areaTreated: '',
    ventilation: '',
    reentryHours: 4,
    ppe: ['Nitrile gloves', 'Eye protection'],
    conditions: { airTempC: null, woodMoisturePercent: null },
    notes: '',
    version: 1,
    recordedById: null,
    recordedByName: 'Test Applicator',
    createdAt: partial.appliedAt ?? '2026-11-05T09:00:00.000Z',
    updatedAt: partial.appliedAt ?? '2026-11-05T09:00:00.000Z',
    versions: [],
    ...partial,
  };
}

/** The planned re-checks of a treatment (recheckDueDates), the first `clean` of them done. */
export function buildRechecks(
  t: TreatmentResponse,
  settings: WorkshopSettings,
  clean = 0,
): RecheckResponse[] {
  const dates = recheckDueDates(t.appliedAt, t.targetAgent, t.method, settings.treatments);
  return dates.map((dueDate, i) => ({
    id: id(),
    vehicleId: 'vehicle',
    treatmentId: t.id,
    zoneKeys: t.zoneKeys,
    dueDate,
    assigneeId: null,
    assigneeName: null,
    status: i < clean ? 'clean' : 'pending',
    completedAt: i < clean ? `${dueDate}T12:00:00.000Z` : null,
    completedByName: i < clean ? 'Test Applicator' : null,
    frassCleaned: i < clean,
    notes: '',
    findingId: null,
    moveReason: '',
    version: 0,
    vehicleLabel: '1927 Test Tourer',
  }));
}

export type SnapshotSpec = {
  planKey?: string;
  generatedAt?: string;
  findings?: FindingSpec[];
  decisions?: DecisionSpec[];
  treatments?: TreatmentResponse[];
  rechecks?: RecheckResponse[];
  surveys?: SurveyResponse[];
  /** Overrides of the computed zone states. */
  states?: { zoneKey: string; state: ZoneState; flagged?: boolean; reason?: string }[];
  settings?: Partial<WorkshopSettings>;
};

export const reportSettings = (partial: Partial<WorkshopSettings> = {}) =>
  workshopSettings.parse({ labourRatePerHour: 48, currency: 'GBP', ...partial });

/**
 * A snapshot on a real body plan. Decisions are computed as the server computes them; zone
 * states come from zoneStateItems() over the findings, treatments and re-checks unless overridden.
 */
export function buildReportSnapshot(spec: SnapshotSpec = {}): ReportSnapshot {
  const plan = reportPlan(spec.planKey);
  const settings = reportSettings(spec.settings);
  const findings = (spec.findings ?? []).map(buildFinding);
  const treatments = spec.treatments ?? [];
  const rechecks = spec.rechecks ?? [];
  const computed = zoneStateItems(
    {
      zoneKeys: plan.zones.map((z) => z.key),
      findings: findings.map((f) => ({ ...f, date: f.surveyDate })),
      treatments,
      rechecks,
    },
    settings.treatments.clearance,
    settings.treatments.timeZone,
  );
  const zoneStates: ZoneStateResponse[] = computed.map((s) => {
    const o = spec.states?.find((x) => x.zoneKey === s.zoneKey);
    return o ? { ...s, flagged: false, reason: 'Set by the test', ...o } : s;
  });
  return {
    kind: 'repair-scope',
    generatedAt: spec.generatedAt ?? '2026-12-01T10:00:00.000Z',
    generatedByName: 'Test Inspector',
    workshop: { id: id(), name: 'Test Coachworks', settings },
    vehicle: {
      id: 'vehicle',
      workshopId: 'workshop',
      year: 1927,
      make: 'Testmoor',
      model: 'Tourer',
      bodyPlanKey: plan.key,
      chassisNumber: 'T-1',
      bodyNumber: 'B-1',
      clientName: 'Test Client',
      storage: 'indoors',
      stage: 'surveying',
      notes: '',
      version: 0,
      createdAt: AT,
      updatedAt: AT,
      deletedAt: null,
      summary: { surveys: 1, findings: findings.length, worstSeverity: null, lastSurveyDate: null },
    },
    surveys: spec.surveys ?? [buildSurvey()],
    findings,
    decisions: (spec.decisions ?? []).map((d) => buildDecision(plan, d, findings, settings)),
    treatments,
    rechecks,
    zoneStates,
  };
}
