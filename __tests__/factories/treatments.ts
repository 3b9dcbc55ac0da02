import { treatmentData, type CreateTreatmentRequest } from '@/shared/schemas/treatment';
import { ReCheck, Treatment, type Vehicle } from '@/server/models';

/** A complete POST body for a brushed borate-style treatment of the left sill (invented label). */
export function buildTreatment(
  partial: Partial<CreateTreatmentRequest> = {},
): CreateTreatmentRequest {
  return {
    appliedAt: '2026-11-25T09:30:00.000Z',
    applicatorName: 'Ada Quill',
    licenceNumber: 'PCO-4471',
    productName: 'Woodguard Test Concentrate',
    registrationNumber: 'TEST-REG-0001',
    activeIngredient: 'disodium octaborate tetrahydrate',
    concentration: '40% w/w',
    formulation: 'soluble concentrate',
    dilution: '1 part to 4 parts water',
    method: 'brush',
    targetAgent: 'anobiid-beetles',
    zoneKeys: ['sill-left'],
    quantity: { amount: 1.5, unit: 'L' },
    areaTreated: 'left sill, 1.7 m',
    ventilation: 'doors open, fan running',
    reentryHours: 4,
    ppe: ['nitrile gloves', 'safety glasses'],
    conditions: { airTempC: 14, woodMoisturePercent: 16 },
    notes: '',
    labelConfirmed: true,
    ...partial,
  };
}

/** A stored treatment row (no re-checks unless `dueDates` are given), as the service leaves it. */
export async function createTreatment(
  vehicle: Vehicle,
  partial: Partial<CreateTreatmentRequest> & { dueDates?: string[]; recordedById?: string } = {},
) {
  const { dueDates = [], recordedById = null, ...fields } = partial;
  // Parsed as the service parses a request: defaults filled in, the id and confirmation dropped.
  const data = treatmentData.parse(buildTreatment(fields));
  const treatment = await Treatment.create({
    workshopId: vehicle.workshopId,
    vehicleId: vehicle.id,
    recordedById,
    data,
    appliedAt: new Date(data.appliedAt),
    zoneKeys: data.zoneKeys,
    method: data.method,
    targetAgent: data.targetAgent,
  });
  for (const dueDate of dueDates) await createRecheck(treatment, { dueDate });
  return treatment;
}

export async function createRecheck(
  treatment: Treatment,
  partial: Partial<ReCheck['_creationAttributes']> = {},
) {
  return ReCheck.create({
    workshopId: treatment.workshopId,
    vehicleId: treatment.vehicleId,
    treatmentId: treatment.id,
    zoneKeys: treatment.zoneKeys,
    dueDate: '2026-12-09',
    assigneeId: null,
    ...partial,
  });
}
