import { z } from 'zod';
import { ROLES } from '../roles';
import { emailSchema } from './auth';
import { isoDateTime, uuid } from './common';

export const UNITS = ['metric', 'imperial'] as const;

const settingsFields = {
  units: z.enum(UNITS),
  region: z.string().trim().max(120),
  labourRatePerHour: z.number().min(0).max(100000),
  currency: z.string().trim().min(1).max(8),
};

export const workshopSettings = z.object({
  units: settingsFields.units.default('metric'),
  region: settingsFields.region.default(''),
  labourRatePerHour: settingsFields.labourRatePerHour.default(0),
  currency: settingsFields.currency.default('EUR'),
});
export type WorkshopSettings = z.infer<typeof workshopSettings>;

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
  settings: z.object(settingsFields).partial().optional(),
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
