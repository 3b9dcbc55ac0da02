import { getBodyPlan } from '@/shared/body-plans';
import { buildRepairScope, repairPlanFromScope } from '@/shared/reports';
import type { RepairPlanResponse } from '@/shared/schemas/repair-plan';
import type { MemberContext } from '../middleware/workshop';
import { collectReportSnapshot } from './report-snapshot';

/** The repair scope as it stands now, from the same snapshot and model a repair-scope PDF uses. */
export async function getRepairPlan(
  member: MemberContext,
  vehicleId: string,
): Promise<RepairPlanResponse> {
  const snapshot = await collectReportSnapshot(member, vehicleId, 'repair-scope');
  const plan = getBodyPlan(snapshot.vehicle.bodyPlanKey);
  if (!plan) throw new Error(`Unknown body plan ${snapshot.vehicle.bodyPlanKey}`);
  return repairPlanFromScope(buildRepairScope(snapshot, plan));
}
