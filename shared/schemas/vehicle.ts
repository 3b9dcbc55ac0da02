import { z } from 'zod';
import { isoDateTime, uuid, withoutDefaults } from './common';

export const STORAGE_PLACES = ['indoors', 'covered', 'outdoors'] as const;
export const VEHICLE_STAGES = ['intake', 'surveying', 'treating', 'repairing', 'complete'] as const;
export type VehicleStage = (typeof VEHICLE_STAGES)[number];

const currentYear = new Date().getFullYear();
const optionalText = (max: number) => z.string().trim().max(max).default('');

/** POST /api/workshops/:wid/vehicles — `id` may be sent by the client so a retry is idempotent. */
export const createVehicleRequest = z.object({
  id: uuid.optional(),
  year: z
    .number()
    .int()
    .min(1885, 'Year looks too early')
    .max(currentYear + 1, 'Year is in the future'),
  make: z.string().trim().min(1, 'Enter the make').max(80),
  model: z.string().trim().min(1, 'Enter the model').max(80),
  bodyPlanKey: z.string().min(1, 'Choose a body plan').max(60),
  chassisNumber: optionalText(60),
  bodyNumber: optionalText(60),
  clientName: optionalText(120),
  storage: z.enum(STORAGE_PLACES).default('indoors'),
  stage: z.enum(VEHICLE_STAGES).default('intake'),
  notes: optionalText(4000),
});
export type CreateVehicleRequest = z.input<typeof createVehicleRequest>;

/** PATCH — `version` is the version the editor loaded; a stale one answers 409. */
export const updateVehicleRequest = z
  .object(withoutDefaults(createVehicleRequest.omit({ id: true }).shape))
  .partial()
  .extend({ version: z.number().int().min(0) });
export type UpdateVehicleRequest = z.input<typeof updateVehicleRequest>;

export const vehicleResponse = z.object({
  id: uuid,
  workshopId: uuid,
  year: z.number(),
  make: z.string(),
  model: z.string(),
  bodyPlanKey: z.string(),
  chassisNumber: z.string(),
  bodyNumber: z.string(),
  clientName: z.string(),
  storage: z.enum(STORAGE_PLACES),
  stage: z.enum(VEHICLE_STAGES),
  notes: z.string(),
  version: z.number(),
  createdAt: isoDateTime,
  updatedAt: isoDateTime,
  deletedAt: isoDateTime.nullable(),
  /** Derived from open (not deleted) findings. */
  summary: z.object({
    surveys: z.number(),
    findings: z.number(),
    worstSeverity: z.number().nullable(),
    lastSurveyDate: z.string().nullable(),
  }),
});
export type VehicleResponse = z.infer<typeof vehicleResponse>;

export const vehicleListQuery = z.object({
  q: z.string().trim().max(100).optional(),
  stage: z.enum(VEHICLE_STAGES).optional(),
  deleted: z.enum(['only', 'include']).optional(),
});

/** Which client-role members may see this vehicle. */
export const vehicleAccessResponse = z.object({
  userId: uuid,
  name: z.string(),
  email: z.string(),
  grantedAt: isoDateTime,
});
export type VehicleAccessResponse = z.infer<typeof vehicleAccessResponse>;
export const grantVehicleAccessRequest = z.object({ userId: uuid });
