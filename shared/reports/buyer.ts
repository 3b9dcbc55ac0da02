/**
 * buildConditionReport(): the buyer's condition report, derived from the repair scope so it
 * lists every structural item the scope holds, in the same order, in plain words.
 */
import type { BodyPlan } from '../body-plans/schema';
import { spokenDate } from '../treatments/dates';
import { buildRepairScope } from './scope';
import type { ConditionReport, MonitorItem, RepairScope, ReportSnapshot, ScopeItem } from './types';

const percent = (share: number) => `${Math.round(share * 100)} %`;

function mustFixWords(item: ScopeItem): string {
  const what = item.findings[0] ? `: ${item.findings[0].toLowerCase()}` : '';
  return `${item.zoneLabel} (${item.tradeLabel.toLowerCase()}) — ${item.verdictLabel.toLowerCase()}${what}.`;
}

function infestationWords(m: MonitorItem): string {
  if (m.state === 'active' && m.flagged)
    return `${m.zoneLabel}: fresh signs of attack after a treatment. A licensed operator should look at it before any repair.`;
  if (m.state === 'active') return `${m.zoneLabel}: signs of live attack; not yet treated.`;
  if (m.state === 'treated-watching') {
    const next = m.nextRechecks[0];
    const when = next
      ? ` Next check due ${spokenDate(next.dueDate)}${next.overdue ? ' (overdue)' : ''}.`
      : '';
    return `${m.zoneLabel}: treated and being watched — ${m.cleanRechecks} of ${m.cleanRechecksNeeded} clean checks so far.${when}`;
  }
  return `${m.zoneLabel}: being watched (${m.stateLabel.toLowerCase()}).`;
}

/** Plain sentences for the summary box. */
export function headline(scope: RepairScope): string[] {
  const c = scope.condition;
  const lines = [
    `Overall: ${c.gradeLabel.toLowerCase()} (${c.gradeRank} of 5). ${c.gradeText}`,
    `${c.primarySound} of ${c.primaryMembers} main frame members (${percent(c.primarySoundShare)}) were found sound.`,
  ];
  const n = scope.structural.length;
  lines.push(
    n === 0
      ? 'No structural member was found that must be fixed.'
      : `${n} structural ${n === 1 ? 'member needs' : 'members need'} repair before the body can be relied on.`,
  );
  if (c.activeZones > 0)
    lines.push(
      `${c.activeZones} ${c.activeZones === 1 ? 'area shows' : 'areas show'} live insect or decay attack.`,
    );
  if (c.watchedZones > 0)
    lines.push(
      `${c.watchedZones} treated ${c.watchedZones === 1 ? 'area is' : 'areas are'} still being watched.`,
    );
  if (c.undecidedZones > 0)
    lines.push(
      `${c.undecidedZones} damaged ${c.undecidedZones === 1 ? 'area has' : 'areas have'} not been assessed for repair yet.`,
    );
  if (scope.notInspected.length > 0)
    lines.push('Some areas could not be inspected; they are listed in this report.');
  return lines;
}

export function conditionReportFromScope(scope: RepairScope): ConditionReport {
  return {
    cover: { ...scope.cover, title: 'Condition report' },
    condition: scope.condition,
    mustFix: scope.structural.map((i) => ({
      zoneLabel: i.zoneLabel,
      verdictLabel: i.verdictLabel,
      plain: mustFixWords(i),
    })),
    infestations: scope.monitor
      .filter((m) => m.state === 'active' || m.state === 'treated-watching')
      .map((m) => ({
        zoneLabel: m.zoneLabel,
        stateLabel: m.stateLabel,
        plain: infestationWords(m),
      })),
    notInspected: scope.notInspected,
    limitations: scope.limitations,
    cautions: scope.cautions,
    headline: headline(scope),
    zoneSeverity: scope.zoneSeverity,
    bodyPlanKey: scope.bodyPlanKey,
    paperSize: scope.paperSize,
  };
}

export function buildConditionReport(snapshot: ReportSnapshot, plan: BodyPlan): ConditionReport {
  return conditionReportFromScope(buildRepairScope(snapshot, plan));
}
