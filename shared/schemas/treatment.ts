import { z } from 'zod';
import { AGENT_LABELS } from '../wood/agents';
import { AGENT_KEYS } from '../wood/types';
import { isoDateTime, uuid } from './common';

export const TREATMENT_METHODS = [
  'brush',
  'spray',
  'foam',
  'injection',
  'bait',
  'heat',
  'freeze',
  'fumigation',
] as const;
export type TreatmentMethod = (typeof TREATMENT_METHODS)[number];

export const TREATMENT_METHOD_LABELS: Record<TreatmentMethod, string> = {
  brush: 'Brushed on',
  spray: 'Sprayed',
  foam: 'Foam',
  injection: 'Injected',
  bait: 'Bait',
  heat: 'Heat',
  freeze: 'Freezing',
  fumigation: 'Fumigation (licensed fumigator)',
};

/** What the treatment was aimed at: an agent from the wood-science list, or not known. */
export const TREATMENT_TARGETS = [...AGENT_KEYS, 'unknown'] as const;
export type TreatmentTarget = (typeof TREATMENT_TARGETS)[number];
export const TREATMENT_TARGET_LABELS: Record<TreatmentTarget, string> = {
  ...AGENT_LABELS,
  unknown: 'Not known',
};

const text = (max: number) => z.string().trim().max(max);
/** Label fields are copied from the product label; Soundframe never fills them in itself. */
const labelText = (what: string) =>
  z.string().trim().min(1, `Enter the ${what} exactly as on the label`).max(200);

const treatmentFields = {
  appliedAt: z.iso.datetime({ offset: true, error: 'Enter the date and time of application' }),
  applicatorName: text(120).min(1, 'Enter who applied it'),
  licenceNumber: text(60).default(''),
  productName: labelText('product name'),
  registrationNumber: labelText('registration number'),
  activeIngredient: labelText('active ingredient'),
  concentration: labelText('concentration'),
  formulation: text(200).default(''),
  /** As mixed on the day, in the label's own terms. */
  dilution: text(200).default(''),
  method: z.enum(TREATMENT_METHODS),
  targetAgent: z.enum(TREATMENT_TARGETS).default('unknown'),
  zoneKeys: z
    .array(z.string().min(1).max(60))
    .min(1, 'Pick at least one zone')
    .max(50)
    .refine((keys) => new Set(keys).size === keys.length, 'A zone is listed twice'),
  quantity: z.object({
    amount: z.number().min(0, 'The amount must not be negative').max(1_000_000),
    unit: text(20).min(1, 'Enter the unit'),
  }),
  /** Area or length treated, in the user's words ("both sills, 2 × 1.6 m"). */
  areaTreated: text(200).default(''),
  ventilation: text(500).default(''),
  reentryHours: z.number().min(0, 'The re-entry time must not be negative').max(8760),
  ppe: z
    .array(text(80).min(1))
    .min(1, 'List the protective equipment worn (from the label)')
    .max(20),
  conditions: z
    .object({
      airTempC: z.number().min(-40).max(70).nullable().default(null),
      woodMoisturePercent: z.number().min(0).max(200).nullable().default(null),
    })
    .default({ airTempC: null, woodMoisturePercent: null }),
  notes: text(4000).default(''),
};

const labelConfirmed = z.literal(true, { error: 'Confirm you read and followed the label' });

/** POST /api/workshops/:wid/vehicles/:vid/treatments */
export const createTreatmentRequest = z.object({
  id: uuid.optional(),
  ...treatmentFields,
  labelConfirmed,
});
export type CreateTreatmentRequest = z.input<typeof createTreatmentRequest>;

/** POST /api/workshops/:wid/treatments/:tid/corrections — a new version; stale `version` → 409. */
export const correctTreatmentRequest = z.object({
  ...treatmentFields,
  labelConfirmed,
  version: z.number().int().min(0),
  reason: text(1000).min(1, 'Say why the record is corrected'),
});
export type CorrectTreatmentRequest = z.input<typeof correctTreatmentRequest>;

/** The recorded fields of one version (stored as JSON; the label confirmation is implied). */
export const treatmentData = z.object(treatmentFields);
export type TreatmentData = z.infer<typeof treatmentData>;

export const treatmentVersionResponse = z.object({
  version: z.number(),
  reason: z.string(),
  changedByName: z.string().nullable(),
  changedAt: isoDateTime,
  data: treatmentData,
});
export type TreatmentVersionResponse = z.infer<typeof treatmentVersionResponse>;

export const treatmentResponse = treatmentData.extend({
  id: uuid,
  vehicleId: uuid,
  version: z.number(),
  recordedById: uuid.nullable(),
  recordedByName: z.string().nullable(),
  createdAt: isoDateTime,
  updatedAt: isoDateTime,
  /** Earlier versions, oldest first. */
  versions: z.array(treatmentVersionResponse),
});
export type TreatmentResponse = z.infer<typeof treatmentResponse>;
