import { repairPlanResponse, type RepairPlanResponse } from '../schemas/repair-plan';
import type { RepairScope } from './types';

/**
 * The part of the repair scope the in-app plan shows: the PDF's lists, totals and cut list. The
 * response schema picks the fields (zod drops the rest), so the field list is written once.
 */
export function repairPlanFromScope(scope: RepairScope): RepairPlanResponse {
  return repairPlanResponse.parse({
    ...scope,
    monitor: scope.monitor.map((m) => ({
      ...m,
      nextDue: m.nextRechecks[0]?.dueDate ?? null,
      overdue: m.nextRechecks[0]?.overdue ?? false,
    })),
  });
}
