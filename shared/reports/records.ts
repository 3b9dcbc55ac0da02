/** The scope's plain records: cut list, treatment history, areas not inspected, cover. */
import { zoneLabel, type BodyPlan } from '../body-plans';
import type { DecisionResponse } from '../schemas/decision';
import { TREATMENT_METHOD_LABELS, type TreatmentResponse } from '../schemas/treatment';
import { SPECIES_LABELS } from '../species';
import { AGENT_LABELS } from '../wood/agents';
import type {
  CutListRow,
  NotInspectedItem,
  ReportCover,
  ReportSnapshot,
  TreatmentHistoryRow,
} from './types';

const time = (iso: string) => new Date(iso).getTime();

export function cutList(plan: BodyPlan, decisions: DecisionResponse[]): CutListRow[] {
  return decisions.flatMap((d) =>
    d.materials.map((m) => ({
      ...m,
      zoneLabel: zoneLabel(plan, d.zoneKey),
      speciesLabel: SPECIES_LABELS[m.species],
    })),
  );
}

export function treatmentRows(
  plan: BodyPlan,
  treatments: TreatmentResponse[],
): TreatmentHistoryRow[] {
  return [...treatments]
    .sort((a, b) => time(a.appliedAt) - time(b.appliedAt))
    .map((t) => ({
      appliedAt: t.appliedAt,
      applicatorName: t.applicatorName,
      licenceNumber: t.licenceNumber,
      productName: t.productName,
      registrationNumber: t.registrationNumber,
      activeIngredient: t.activeIngredient,
      concentration: t.concentration,
      method: TREATMENT_METHOD_LABELS[t.method],
      target: t.targetAgent === 'unknown' ? 'Not known' : AGENT_LABELS[t.targetAgent],
      zoneLabels: t.zoneKeys.map((k) => zoneLabel(plan, k)),
      quantity: `${t.quantity.amount} ${t.quantity.unit}`,
      reentryHours: t.reentryHours,
      ppe: [...t.ppe],
      version: t.version,
    }));
}

/** Every survey's unreachable zones and note, newest survey first. */
export function notInspectedItems(snapshot: ReportSnapshot, plan: BodyPlan): NotInspectedItem[] {
  return [...snapshot.surveys]
    .sort((a, b) => b.date.localeCompare(a.date))
    .flatMap((s) => [
      ...s.notAccessibleZones.map((k) => ({ date: s.date, what: zoneLabel(plan, k) })),
      ...(s.notAccessibleNotes.trim() ? [{ date: s.date, what: s.notAccessibleNotes.trim() }] : []),
    ]);
}

export function reportCover(snapshot: ReportSnapshot, plan: BodyPlan, title: string): ReportCover {
  const { vehicle } = snapshot;
  const latest = [...snapshot.surveys].sort(
    (a, b) => b.date.localeCompare(a.date) || time(b.createdAt) - time(a.createdAt),
  )[0];
  return {
    title,
    workshopName: snapshot.workshop.name,
    vehicleTitle: `${vehicle.year} ${vehicle.make} ${vehicle.model}`,
    chassisNumber: vehicle.chassisNumber,
    bodyNumber: vehicle.bodyNumber,
    clientName: vehicle.clientName,
    bodyPlanName: plan.name,
    inspectorName: latest?.inspectorName ?? null,
    latestSurveyDate: latest?.date ?? null,
    generatedAt: snapshot.generatedAt,
    generatedByName: snapshot.generatedByName,
  };
}
