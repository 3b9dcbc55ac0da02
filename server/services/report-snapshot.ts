import type { ReportKind, ReportSnapshot } from '@/shared/reports/types';
import type { MemberContext } from '../middleware/workshop';
import { User } from '../models';
import { listDecisions } from './decisions';
import { listFindings } from './findings';
import { listVehicleRechecks } from './rechecks';
import { listSurveys } from './surveys';
import { listTreatments } from './treatments';
import { getVehicle } from './vehicles';
import { getWorkshop } from './workshops';
import { zoneStatesFrom } from './zone-states';

/**
 * Freezes everything a report is drawn from, through the same services (and access checks) the
 * API answers with: a vehicle the caller cannot read is a 404 (from each of them).
 */
export async function collectReportSnapshot(
  member: MemberContext,
  vehicleId: string,
  kind: ReportKind,
): Promise<ReportSnapshot> {
  const [workshop, vehicle, surveys, findings, decisions, treatments, rechecks, user] =
    await Promise.all([
      getWorkshop(member),
      getVehicle(member, vehicleId),
      listSurveys(member, vehicleId),
      listFindings(member, vehicleId, {}),
      listDecisions(member, vehicleId),
      listTreatments(member, vehicleId),
      listVehicleRechecks(member, vehicleId),
      User.findByPk(member.userId, { attributes: ['id', 'name'] }),
    ]);
  return {
    kind,
    generatedAt: new Date().toISOString(),
    generatedByName: user?.name ?? '',
    workshop: { id: workshop.id, name: workshop.name, settings: workshop.settings },
    vehicle,
    surveys,
    findings,
    decisions,
    // The services answer newest first; the history reads in the order the work was done.
    treatments: [...treatments].reverse(),
    rechecks,
    zoneStates: zoneStatesFrom(
      vehicle.bodyPlanKey,
      workshop.settings.treatments,
      findings,
      treatments,
      rechecks,
    ),
  };
}
