import { getBodyPlan } from '@/shared/body-plans';
import type { ZoneStateResponse } from '@/shared/schemas/recheck';
import { zoneStateItems } from '@/shared/treatments';
import { notFound } from '../errors';
import type { MemberContext } from '../middleware/workshop';
import { Finding, ReCheck, Survey, Treatment, Workshop } from '../models';
import { findVehicleFor } from './vehicle-access';
import { readSettings } from './workshops';

/**
 * The state of every zone of a vehicle's body plan, derived from its open findings, treatments
 * and re-checks with the workshop's clearance rule (never stored, so it cannot drift).
 */
export async function getZoneStates(
  member: MemberContext,
  vehicleId: string,
): Promise<ZoneStateResponse[]> {
  const vehicle = await findVehicleFor(member, vehicleId);
  const workshop = await Workshop.findByPk(member.workshopId);
  if (!workshop) throw notFound('Workshop');
  const { clearance, timeZone } = readSettings(workshop.settings).treatments;
  const [findings, treatments, rechecks] = await Promise.all([
    Finding.findAll({
      where: { vehicleId: vehicle.id },
      include: [{ model: Survey, as: 'survey', attributes: ['id', 'date'] }],
    }),
    Treatment.findAll({ where: { vehicleId: vehicle.id } }),
    ReCheck.findAll({ where: { vehicleId: vehicle.id } }),
  ]);
  const zoneKeys = getBodyPlan(vehicle.bodyPlanKey)?.zones.map((z) => z.key) ?? [];
  return zoneStateItems(
    {
      zoneKeys,
      findings: findings.map((f) => ({
        zoneKey: f.zoneKey,
        date: f.survey?.date ?? f.createdAt.toISOString().slice(0, 10),
        createdAt: f.createdAt.toISOString(),
        severity: f.severity,
        activity: f.activity,
        insectEvidence: f.insectEvidence,
        decayType: f.decayType,
      })),
      treatments: treatments.map((t) => ({
        id: t.id,
        appliedAt: t.appliedAt.toISOString(),
        zoneKeys: t.zoneKeys,
      })),
      rechecks: rechecks.map((r) => ({
        treatmentId: r.treatmentId,
        zoneKeys: r.zoneKeys,
        dueDate: r.dueDate,
        status: r.status,
        completedAt: r.completedAt ? r.completedAt.toISOString() : null,
      })),
    },
    clearance,
    timeZone,
  );
}
