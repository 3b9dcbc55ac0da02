import type { RepairPlanItem, RepairPlanResponse } from '../schemas/repair-plan';
import type { RepairScope, ScopeItem } from './types';

const item = (i: ScopeItem): RepairPlanItem => ({
  zoneKey: i.zoneKey,
  zoneLabel: i.zoneLabel,
  verdictLabel: i.verdictLabel,
  reasons: i.reasons,
  worstSeverity: i.worstSeverity,
  hours: i.hours,
  totalCost: i.totalCost,
  boardFeet: i.boardFeet,
});

/** The part of the repair scope the in-app plan shows: the PDF's lists, totals and cut list. */
export function repairPlanFromScope(scope: RepairScope): RepairPlanResponse {
  const { totals } = scope;
  return {
    condition: scope.condition,
    structural: scope.structural.map(item),
    cosmetic: scope.cosmetic.map(item),
    monitor: scope.monitor.map((m) => ({
      zoneKey: m.zoneKey,
      zoneLabel: m.zoneLabel,
      stateLabel: m.stateLabel,
      reason: m.reason,
      nextDue: m.nextRechecks[0]?.dueDate ?? null,
      overdue: m.nextRechecks[0]?.overdue ?? false,
    })),
    undecided: scope.undecided.map((u) => ({
      zoneKey: u.zoneKey,
      zoneLabel: u.zoneLabel,
      worstSeverity: u.worstSeverity,
    })),
    totals: {
      hours: totals.hours,
      totalCost: totals.totalCost,
      currency: totals.currency,
      structural: totals.structural,
      cosmetic: totals.cosmetic,
      boardFeetBySpecies: totals.boardFeetBySpecies.map((b) => ({
        label: b.label,
        boardFeet: b.boardFeet,
        cost: b.cost,
      })),
    },
    cutList: scope.cutList.map((c) => ({
      zoneLabel: c.zoneLabel,
      speciesLabel: c.speciesLabel,
      finishedThicknessMm: c.finishedThicknessMm,
      finishedWidthMm: c.finishedWidthMm,
      finishedLengthMm: c.finishedLengthMm,
      roughQuarters: c.roughQuarters,
      boardFeetWithWaste: c.boardFeetWithWaste,
      cost: c.cost,
    })),
    workOrder: scope.workOrder,
    units: scope.units,
  };
}
