import { getBodyPlan, zoneLabel } from '@/shared/body-plans';
import { INSECT_EVIDENCE_LABELS, SEVERITY_LABELS } from '@/shared/schemas/finding';
import {
  RECHECK_STATUS_LABELS,
  type RecheckStatus,
  type TimelineItem,
  type TimelineKind,
} from '@/shared/schemas/recheck';
import { TREATMENT_METHOD_LABELS } from '@/shared/schemas/treatment';
import { spokenDate } from '@/shared/treatments/dates';
import type { MemberContext } from '../middleware/workshop';
import { Finding, ReCheck, Survey, Treatment } from '../models';
import { findVehicleFor } from './vehicle-access';

/** Newest first; at the same moment a later step of the work comes first. */
const RANK: Record<TimelineKind, number> = { recheck: 0, treatment: 1, finding: 2, survey: 3 };

/** A calendar date as the start of that day, for sorting against timestamps. */
const dayStart = (date: string) => `${date}T00:00:00.000Z`;

/**
 * Surveys, findings, treatments and re-checks of one vehicle in one list, newest first.
 * Findings are placed on their survey's date; re-checks on the day they were done, or are due.
 * Day-only entries say so (`allDay`), so a client never shifts them into another day's clock.
 */
export async function getTimeline(
  member: MemberContext,
  vehicleId: string,
  kinds: TimelineKind[],
): Promise<TimelineItem[]> {
  const vehicle = await findVehicleFor(member, vehicleId);
  const plan = getBodyPlan(vehicle.bodyPlanKey);
  const zone = (key: string) => zoneLabel(plan, key);
  const wanted = new Set(kinds);
  const where = { vehicleId: vehicle.id };
  const items: TimelineItem[] = [];

  if (wanted.has('survey'))
    for (const s of await Survey.findAll({ where }))
      items.push({
        kind: 'survey',
        id: s.id,
        at: dayStart(s.date),
        allDay: true,
        planned: false,
        title: `Survey (${s.purpose.replace('-', ' ')})`,
        detail: s.notes,
        zoneKeys: [],
      });

  if (wanted.has('finding'))
    for (const f of await Finding.findAll({
      where,
      include: [{ model: Survey, as: 'survey', attributes: ['id', 'date'] }],
    })) {
      const seen = f.insectEvidence.map((e) => INSECT_EVIDENCE_LABELS[e].toLowerCase());
      items.push({
        kind: 'finding',
        id: f.id,
        at: f.survey ? dayStart(f.survey.date) : f.createdAt.toISOString(),
        allDay: !!f.survey,
        planned: false,
        title: `${zone(f.zoneKey)}: ${SEVERITY_LABELS[f.severity]?.title ?? ''} (${f.severity})`,
        detail: [f.activity === 'active' ? 'active' : '', ...seen, f.notes]
          .filter(Boolean)
          .join('; '),
        zoneKeys: [f.zoneKey],
      });
    }

  if (wanted.has('treatment'))
    for (const t of await Treatment.findAll({ where }))
      items.push({
        kind: 'treatment',
        id: t.id,
        at: t.appliedAt.toISOString(),
        allDay: false,
        planned: false,
        title: `${TREATMENT_METHOD_LABELS[t.data.method]}: ${t.data.productName}`,
        detail: `${t.data.activeIngredient} ${t.data.concentration}, reg. ${t.data.registrationNumber}; by ${t.data.applicatorName}`,
        zoneKeys: t.zoneKeys,
      });

  if (wanted.has('recheck'))
    for (const r of await ReCheck.findAll({ where })) {
      const pending = r.status === 'pending';
      items.push({
        kind: 'recheck',
        id: r.id,
        at: r.completedAt ? r.completedAt.toISOString() : dayStart(r.dueDate),
        allDay: !r.completedAt,
        planned: pending,
        title: pending
          ? `Re-check due ${spokenDate(r.dueDate)}`
          : `Re-check ${RECHECK_STATUS_LABELS[r.status as RecheckStatus].toLowerCase()}`,
        // The zones travel in zoneKeys; the detail carries only what they do not say.
        detail: [r.moveReason && `moved: ${r.moveReason}`, r.notes].filter(Boolean).join('; '),
        zoneKeys: r.zoneKeys,
      });
    }

  return items.sort(
    (a, b) => b.at.localeCompare(a.at) || RANK[a.kind] - RANK[b.kind] || a.id.localeCompare(b.id),
  );
}
