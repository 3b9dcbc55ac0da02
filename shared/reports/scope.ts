/**
 * buildRepairScope(): the repair scope (what the owner budgets from) from a frozen snapshot.
 * Pure; the PDF renderer, the share page and the buyer's report all start from it.
 */
import { getZone, STRUCTURAL_CLASSES, TRADE_NAME_LABELS, type BodyPlan } from '../body-plans';
import type { DecisionResponse } from '../schemas/decision';
import type { FindingResponse } from '../schemas/finding';
import { ZONE_STATE_LABELS, type ZoneState } from '../schemas/recheck';
import { SPECIES_LABELS } from '../species';
import { localDate } from '../treatments/dates';
import { cleanRechecksSince, latestTreatment } from '../treatments/zone-state';
import { VERDICT_OPTION_LABELS } from '../wood/verdict';
import { conditionSummary } from './condition';
import { cutList, notInspectedItems, reportCover, treatmentRows } from './records';
import { findingWords, reportCautions, SURVEY_LIMITATIONS } from './text';
import type {
  CutListRow,
  MonitorItem,
  RepairScope,
  ReportSnapshot,
  ScopeItem,
  ScopeTotals,
} from './types';
import { orderOfWork } from './work-order';

const time = (iso: string) => new Date(iso).getTime();

/** Zone key → worst open severity, every zone of the plan (0 when none). */
export function zoneSeverities(plan: BodyPlan, findings: readonly FindingResponse[]) {
  const out: Record<string, number> = Object.fromEntries(plan.zones.map((z) => [z.key, 0]));
  for (const f of findings) {
    if (f.deletedAt || !(f.zoneKey in out)) continue;
    out[f.zoneKey] = Math.max(out[f.zoneKey], f.severity);
  }
  return out;
}

function openFindings(snapshot: ReportSnapshot, zoneKey: string) {
  return snapshot.findings
    .filter((f) => f.zoneKey === zoneKey && !f.deletedAt)
    .sort((a, b) => b.severity - a.severity || time(b.createdAt) - time(a.createdAt));
}

function scopeItem(snapshot: ReportSnapshot, plan: BodyPlan, d: DecisionResponse): ScopeItem {
  const zone = getZone(plan, d.zoneKey);
  const findings = openFindings(snapshot, d.zoneKey);
  const reasons = [...d.recommendationReasons];
  if (d.chosenOption !== d.recommendedOption && d.overrideReason)
    reasons.push(
      `Chosen over the recommendation (${VERDICT_OPTION_LABELS[d.recommendedOption].toLowerCase()}): ${d.overrideReason}`,
    );
  const species = [...new Set(d.materials.map((m) => m.species))];
  return {
    zoneKey: d.zoneKey,
    zoneLabel: zone?.label ?? d.zoneKey,
    tradeName: zone?.tradeName ?? 'skin-panel',
    tradeLabel: zone ? TRADE_NAME_LABELS[zone.tradeName] : d.zoneKey,
    structuralClass: zone?.structuralClass ?? 'non-structural',
    assembly: zone?.assembly ?? null,
    findings: findings.map(findingWords),
    worstSeverity: Math.max(0, ...findings.map((f) => f.severity)),
    verdict: d.chosenOption,
    verdictLabel: VERDICT_OPTION_LABELS[d.chosenOption],
    reasons,
    decisionClass: d.decisionClass,
    hours: d.estimatedHours,
    labourCost: d.labourCost,
    materialCost: d.materialCost,
    totalCost: d.totalCost,
    boardFeet: d.materials.reduce((s, m) => s + m.boardFeetWithWaste, 0),
    species: species.length ? species : [d.inputs.species],
    photoIds: findings.flatMap((f) => f.photos.map((p) => p.id)),
  };
}

/** Primary first, then worst severity, then label. */
function byClassSeverityLabel(a: ScopeItem, b: ScopeItem) {
  const cls =
    STRUCTURAL_CLASSES.indexOf(a.structuralClass) - STRUCTURAL_CLASSES.indexOf(b.structuralClass);
  return cls || b.worstSeverity - a.worstSeverity || a.zoneLabel.localeCompare(b.zoneLabel);
}

const bySeverityLabel = (a: ScopeItem, b: ScopeItem) =>
  b.worstSeverity - a.worstSeverity || a.zoneLabel.localeCompare(b.zoneLabel);

function monitorItems(
  snapshot: ReportSnapshot,
  plan: BodyPlan,
  monitorDecisions: ScopeItem[],
): MonitorItem[] {
  const { timeZone, clearance } = snapshot.workshop.settings.treatments;
  const today = localDate(snapshot.generatedAt, timeZone, 'generatedAt');
  const watched: ZoneState[] = ['active', 'treated-watching'];
  const keys = new Set([
    ...snapshot.zoneStates.filter((s) => watched.includes(s.state)).map((s) => s.zoneKey),
    ...monitorDecisions.map((d) => d.zoneKey),
  ]);
  const items = plan.zones
    .filter((z) => keys.has(z.key))
    .map((zone): MonitorItem => {
      const st = snapshot.zoneStates.find((s) => s.zoneKey === zone.key);
      const state = st?.state ?? 'no-evidence';
      const latest = latestTreatment(zone.key, snapshot.treatments);
      const rechecks = snapshot.rechecks.filter((r) => r.zoneKeys.includes(zone.key));
      const decision = monitorDecisions.find((d) => d.zoneKey === zone.key) ?? null;
      return {
        zoneKey: zone.key,
        zoneLabel: zone.label,
        state,
        stateLabel: ZONE_STATE_LABELS[state],
        flagged: st?.flagged ?? false,
        reason: st?.reason || decision?.reasons[0] || '',
        nextRechecks: rechecks
          .filter((r) => r.status === 'pending')
          .map((r) => ({ dueDate: r.dueDate, overdue: r.dueDate < today }))
          .sort((a, b) => a.dueDate.localeCompare(b.dueDate)),
        // As the zone state counts them: clean and completed after the zone's latest treatment.
        cleanRechecks: latest ? cleanRechecksSince(zone.key, rechecks, latest.appliedAt).length : 0,
        cleanRechecksNeeded: clearance.cleanChecksRequired,
        decision,
      };
    });
  const rank = (m: MonitorItem) =>
    m.state === 'active' ? 0 : m.state === 'treated-watching' ? 1 : 2;
  return items.sort((a, b) => rank(a) - rank(b) || a.zoneLabel.localeCompare(b.zoneLabel));
}

/**
 * Sums of every decided item: structural, cosmetic and the monitor list's decisions (keeping
 * a member still costs an inspection's hours). Unrounded, so the sums can be checked exactly.
 */
function totals(
  snapshot: ReportSnapshot,
  structural: ScopeItem[],
  cosmetic: ScopeItem[],
  monitor: ScopeItem[],
  all: DecisionResponse[],
): ScopeTotals {
  const sum = (xs: ScopeItem[], f: (i: ScopeItem) => number) => xs.reduce((s, i) => s + f(i), 0);
  const items = [...structural, ...cosmetic, ...monitor];
  const group = (xs: ScopeItem[]) => ({
    hours: sum(xs, (i) => i.hours),
    totalCost: sum(xs, (i) => i.totalCost),
    count: xs.length,
  });
  const species = new Map<string, { boardFeet: number; cost: number }>();
  for (const d of all)
    for (const m of d.materials) {
      const row = species.get(m.species) ?? { boardFeet: 0, cost: 0 };
      row.boardFeet += m.boardFeetWithWaste;
      row.cost += m.cost;
      species.set(m.species, row);
    }
  return {
    hours: sum(items, (i) => i.hours),
    labourCost: sum(items, (i) => i.labourCost),
    materialCost: sum(items, (i) => i.materialCost),
    totalCost: sum(items, (i) => i.totalCost),
    structural: group(structural),
    cosmetic: group(cosmetic),
    monitor: group(monitor),
    boardFeetBySpecies: [...species.entries()]
      .map(([key, v]) => ({
        species: key as CutListRow['species'],
        label: SPECIES_LABELS[key as CutListRow['species']],
        boardFeet: v.boardFeet,
        cost: v.cost,
      }))
      .sort((a, b) => a.label.localeCompare(b.label)),
    currency: snapshot.workshop.settings.currency,
  };
}

/** Zone key → findings recorded on it, for the zones of the plan (`zoneSeverity` has them all). */
function findingCounts(zoneSeverity: Record<string, number>, findings: ReportSnapshot['findings']) {
  const counts: Record<string, number> = {};
  for (const f of findings)
    if (f.zoneKey in zoneSeverity) counts[f.zoneKey] = (counts[f.zoneKey] ?? 0) + 1;
  return counts;
}

export function buildRepairScope(snapshot: ReportSnapshot, plan: BodyPlan): RepairScope {
  const decisions = snapshot.decisions.filter((d) => getZone(plan, d.zoneKey));
  const items = decisions.map((d) => scopeItem(snapshot, plan, d));
  const structural = items
    .filter((i) => i.decisionClass === 'structural-must-fix')
    .sort(byClassSeverityLabel);
  const cosmetic = items.filter((i) => i.decisionClass === 'cosmetic').sort(bySeverityLabel);
  const monitorDecisions = items.filter((i) => i.decisionClass === 'monitor');
  const monitor = monitorItems(snapshot, plan, monitorDecisions);
  const zoneSeverity = zoneSeverities(plan, snapshot.findings);
  const decided = new Set(decisions.map((d) => d.zoneKey));
  const undecided = plan.zones
    .filter((z) => zoneSeverity[z.key] >= 2 && !decided.has(z.key))
    .map((z) => ({
      zoneKey: z.key,
      zoneLabel: z.label,
      worstSeverity: zoneSeverity[z.key],
      findings: openFindings(snapshot, z.key).map(findingWords),
    }))
    .sort((a, b) => b.worstSeverity - a.worstSeverity || a.zoneLabel.localeCompare(b.zoneLabel));
  const activeKeys = new Set(
    snapshot.zoneStates.filter((s) => s.state === 'active').map((s) => s.zoneKey),
  );
  const workItems = [
    // Keeping a member is no work on it; only the treatment step can still apply.
    ...[...structural, ...cosmetic].map((i) => ({
      zoneKey: i.zoneKey,
      needsTreatment: activeKeys.has(i.zoneKey),
      repair: i.verdict !== 'keep',
    })),
    ...[...activeKeys].map((zoneKey) => ({ zoneKey, needsTreatment: true, repair: false })),
  ];
  const { settings } = snapshot.workshop;
  return {
    cover: reportCover(snapshot, plan, 'Repair scope'),
    condition: conditionSummary({
      plan,
      worstSeverity: zoneSeverity,
      decisions,
      zoneStates: snapshot.zoneStates,
    }),
    structural,
    cosmetic,
    monitor,
    undecided,
    totals: totals(snapshot, structural, cosmetic, monitorDecisions, decisions),
    cutList: cutList(plan, decisions),
    workOrder: orderOfWork(workItems, plan),
    treatments: treatmentRows(plan, snapshot.treatments),
    notInspected: notInspectedItems(snapshot, plan),
    limitations: [...SURVEY_LIMITATIONS],
    cautions: reportCautions(),
    zoneSeverity,
    zoneFindingCount: findingCounts(zoneSeverity, snapshot.findings),
    bodyPlanKey: plan.key,
    units: settings.units,
    paperSize: settings.paperSize,
  };
}
