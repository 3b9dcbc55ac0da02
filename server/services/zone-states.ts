import { getBodyPlan } from '@/shared/body-plans';
import type { FindingResponse } from '@/shared/schemas/finding';
import type { RecheckResponse, ZoneStateResponse } from '@/shared/schemas/recheck';
import type { TreatmentResponse } from '@/shared/schemas/treatment';
import type { WorkshopSettings } from '@/shared/schemas/workshop';
import { zoneStateItems } from '@/shared/treatments';
import type { MemberContext } from '../middleware/workshop';
import { Finding, ReCheck, Survey, Treatment } from '../models';
import { toFindingResponse } from './findings';
import { toRecheckResponse } from './rechecks';
import { toTreatmentResponse } from './treatments';
import { findVehicleFor } from './vehicle-access';
import { settingsOf } from './workshops';

/**
 * The state of every zone of a body plan from a vehicle's open findings, treatments and
 * re-checks (as the API answers them) with the workshop's clearance rule.
 */
export function zoneStatesFrom(
  bodyPlanKey: string,
  { clearance, timeZone }: WorkshopSettings['treatments'],
  findings: readonly FindingResponse[],
  treatments: readonly TreatmentResponse[],
  rechecks: readonly RecheckResponse[],
): ZoneStateResponse[] {
  return zoneStateItems(
    {
      zoneKeys: getBodyPlan(bodyPlanKey)?.zones.map((z) => z.key) ?? [],
      findings: findings.map((f) => ({
        zoneKey: f.zoneKey,
        date: f.surveyDate || f.createdAt.slice(0, 10),
        createdAt: f.createdAt,
        severity: f.severity,
        activity: f.activity,
        insectEvidence: f.insectEvidence,
      })),
      treatments,
      rechecks,
    },
    clearance,
    timeZone,
  );
}

/** zoneStatesFrom() for one vehicle, loaded (never stored, so it cannot drift). */
export async function getZoneStates(
  member: MemberContext,
  vehicleId: string,
): Promise<ZoneStateResponse[]> {
  const vehicle = await findVehicleFor(member, vehicleId);
  const [settings, findings, treatments, rechecks] = await Promise.all([
    settingsOf(member.workshopId),
    Finding.findAll({
      where: { vehicleId: vehicle.id },
      include: [{ model: Survey, as: 'survey', attributes: ['id', 'date'] }],
    }),
    Treatment.findAll({ where: { vehicleId: vehicle.id } }),
    ReCheck.findAll({ where: { vehicleId: vehicle.id } }),
  ]);
  return zoneStatesFrom(
    vehicle.bodyPlanKey,
    settings.treatments,
    findings.map(toFindingResponse),
    treatments.map(toTreatmentResponse),
    rechecks.map((r) => toRecheckResponse(r, vehicle)),
  );
}
