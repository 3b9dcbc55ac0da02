import { z } from 'zod';
import { ROLES } from '../roles';
import {
  clearanceRuleSchema,
  DEFAULT_TREATMENT_SETTINGS,
  PLAN_GROUPS,
  treatmentSettingsSchema,
  type PlanGroup,
} from '../treatments/settings';
import { DEFAULT_WOOD_SETTINGS, verdictRulesSchema, woodSettingsSchema } from '../wood/settings';
import { emailSchema } from './auth';
import { isoDateTime, uuid } from './common';
import { PAPER_SIZES } from './report';

export const UNITS = ['metric', 'imperial'] as const;

const settingsFields = {
  units: z.enum(UNITS),
  region: z.string().trim().max(120),
  labourRatePerHour: z.number().min(0).max(100000),
  currency: z.string().trim().min(1).max(8),
  paperSize: z.enum(PAPER_SIZES),
};

export const workshopSettings = z.object({
  units: settingsFields.units.default('metric'),
  region: settingsFields.region.default(''),
  labourRatePerHour: settingsFields.labourRatePerHour.default(0),
  currency: settingsFields.currency.default('EUR'),
  /** Paper of the generated reports. */
  paperSize: settingsFields.paperSize.default('A4'),
  wood: woodSettingsSchema.default(() => structuredClone(DEFAULT_WOOD_SETTINGS)),
  treatments: treatmentSettingsSchema.default(() => structuredClone(DEFAULT_TREATMENT_SETTINGS)),
});
export type WorkshopSettings = z.infer<typeof workshopSettings>;

const wood = woodSettingsSchema.shape;

/**
 * A PATCH of the wood settings: any subset at any depth. The server merges it over the saved
 * value and validates the whole (so cross-field rules such as consolidate ≤ keep still hold).
 * Built from the shapes because zod refuses `.partial()` on a refined object.
 */
export const woodSettingsPatch = z
  .object({
    verdictRules: z.object(verdictRulesSchema.shape).partial(),
    scarfSlope: wood.scarfSlope,
    hoursPerOperation: wood.hoursPerOperation.partial(),
    timberPricePerBoardFoot: wood.timberPricePerBoardFoot.partial(),
    wasteFactorPercent: wood.wasteFactorPercent,
  })
  .partial();
export type WoodSettingsPatch = z.infer<typeof woodSettingsPatch>;

const treatments = treatmentSettingsSchema.shape;

/** A PATCH of the treatment settings: any subset; a plan's list of days is replaced whole. */
export const treatmentSettingsPatch = z
  .object({
    recheckPlans: z
      .object(
        Object.fromEntries(PLAN_GROUPS.map((g) => [g, treatments.recheckPlans.shape[g]])) as {
          [G in PlanGroup]: (typeof treatments.recheckPlans.shape)[G];
        },
      )
      .partial(),
    clearance: clearanceRuleSchema.partial(),
    timeZone: treatments.timeZone,
    regulatoryNotes: treatments.regulatoryNotes,
  })
  .partial();
export type TreatmentSettingsPatch = z.infer<typeof treatmentSettingsPatch>;

const isPlainObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);

function deepMerge(base: unknown, patch: unknown): unknown {
  if (patch === undefined) return base;
  if (!isPlainObject(base) || !isPlainObject(patch)) return patch;
  const out: Record<string, unknown> = { ...base };
  for (const [k, v] of Object.entries(patch)) out[k] = deepMerge(base[k], v);
  return out;
}

/**
 * Settings (wood or treatments) with `patch` laid over `base` key by key (not validated: parse
 * the result with the section's schema). Also fills a saved value from before a key existed
 * with its default.
 */
export function mergeSettings(base: object, patch: unknown): unknown {
  return deepMerge(base, patch);
}

export const workshopResponse = z.object({
  id: uuid,
  name: z.string(),
  settings: workshopSettings,
  role: z.enum(ROLES), // the caller's role here
});
export type WorkshopResponse = z.infer<typeof workshopResponse>;

export const updateWorkshopRequest = z.object({
  name: z.string().trim().min(2).max(120).optional(),
  // No defaults here: a key left out keeps its saved value (defaults would overwrite it).
  settings: z
    .object({ ...settingsFields, wood: woodSettingsPatch, treatments: treatmentSettingsPatch })
    .partial()
    .optional(),
});

export const memberResponse = z.object({
  id: uuid, // membership id
  userId: uuid,
  name: z.string(),
  email: z.string(),
  role: z.enum(ROLES),
  createdAt: isoDateTime,
});
export type MemberResponse = z.infer<typeof memberResponse>;

export const updateMemberRequest = z.object({ role: z.enum(ROLES) });

export const invitationResponse = z.object({
  id: uuid,
  email: z.string(),
  role: z.enum(ROLES),
  invitedBy: z.string(),
  expiresAt: isoDateTime,
  acceptedAt: isoDateTime.nullable(),
  createdAt: isoDateTime,
});
export type InvitationResponse = z.infer<typeof invitationResponse>;

export const createInvitationRequest = z.object({
  email: emailSchema,
  role: z.enum(ROLES),
});
export type CreateInvitationRequest = z.infer<typeof createInvitationRequest>;

export const auditEntryResponse = z.object({
  id: uuid,
  at: isoDateTime,
  actorName: z.string().nullable(),
  action: z.string(), // e.g. 'finding.create'
  entityType: z.string(),
  entityId: z.string(),
  summary: z.string(),
});
export type AuditEntryResponse = z.infer<typeof auditEntryResponse>;

/** GET /api/workshops/:wid/audit — newest first, a page at a time. */
export const auditListQuery = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
});
export type AuditListQuery = z.infer<typeof auditListQuery>;

export const outboxMessage = z.object({
  id: z.string(),
  receivedAt: isoDateTime,
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  links: z.array(z.string()),
});
export type OutboxMessage = z.infer<typeof outboxMessage>;
