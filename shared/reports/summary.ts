import { REPORT_KIND_LABELS, type ReportKind, type ReportSummary } from '../schemas/report';
import { conditionReportFromScope } from './buyer';
import type { RepairScope } from './types';

/**
 * What the share and verification pages show (reportSummarySchema); totals only for the repair
 * scope. `buyer` is the condition report of the same scope, when the caller has built it already.
 */
export function reportSummary(
  kind: ReportKind,
  scope: RepairScope,
  buyer = conditionReportFromScope(scope),
): ReportSummary {
  return {
    kind,
    title: REPORT_KIND_LABELS[kind],
    workshopName: scope.cover.workshopName,
    vehicleTitle: scope.cover.vehicleTitle,
    inspectorName: scope.cover.inspectorName,
    latestSurveyDate: scope.cover.latestSurveyDate,
    condition: scope.condition,
    mustFix: buyer.mustFix.map(({ zoneLabel, verdictLabel }) => ({ zoneLabel, verdictLabel })),
    infestations: buyer.infestations.map(({ zoneLabel, stateLabel }) => ({
      zoneLabel,
      stateLabel,
    })),
    notInspected: scope.notInspected,
    totals:
      kind === 'repair-scope'
        ? {
            hours: scope.totals.hours,
            totalCost: scope.totals.totalCost,
            currency: scope.totals.currency,
          }
        : null,
    diagram: {
      bodyPlanKey: scope.bodyPlanKey,
      zones: Object.fromEntries(
        Object.entries(scope.zoneFindingCount).map(([zoneKey, count]) => [
          zoneKey,
          { worstSeverity: scope.zoneSeverity[zoneKey] ?? 0, count },
        ]),
      ),
    },
  };
}
