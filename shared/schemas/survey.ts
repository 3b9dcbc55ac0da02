import { z } from 'zod';
import { isoDate, isoDateTime, uuid, withoutDefaults } from './common';

export const SURVEY_PURPOSES = ['baseline', 'pre-purchase', 'post-treatment', 'progress'] as const;
export type SurveyPurpose = (typeof SURVEY_PURPOSES)[number];

export const createSurveyRequest = z.object({
  id: uuid.optional(),
  date: isoDate,
  purpose: z.enum(SURVEY_PURPOSES),
  /** Shop air temperature, °C, and relative humidity, % — for equilibrium moisture content. */
  airTempC: z.number().min(-30).max(60).nullable().default(null),
  relativeHumidity: z.number().min(0).max(100).nullable().default(null),
  /** Areas that could not be reached: zone keys from the body plan and/or free text. */
  notAccessibleZones: z.array(z.string().max(60)).max(200).default([]),
  notAccessibleNotes: z.string().trim().max(4000).default(''),
  notes: z.string().trim().max(4000).default(''),
});
export type CreateSurveyRequest = z.input<typeof createSurveyRequest>;
export const updateSurveyRequest = z
  .object(withoutDefaults(createSurveyRequest.omit({ id: true }).shape))
  .partial();

export const surveyResponse = z.object({
  id: uuid,
  vehicleId: uuid,
  date: z.string(),
  purpose: z.enum(SURVEY_PURPOSES),
  airTempC: z.number().nullable(),
  relativeHumidity: z.number().nullable(),
  notAccessibleZones: z.array(z.string()),
  notAccessibleNotes: z.string(),
  notes: z.string(),
  inspectorId: uuid.nullable(),
  inspectorName: z.string().nullable(),
  findingCount: z.number(),
  createdAt: isoDateTime,
});
export type SurveyResponse = z.infer<typeof surveyResponse>;
