import { z } from 'zod';
import { ROLES } from '../roles';
import { emailSchema } from './auth';
import { isoDateTime, uuid } from './common';

export const UNITS = ['metric', 'imperial'] as const;

export const workshopSettings = z.object({
  units: z.enum(UNITS).default('metric'),
  region: z.string().trim().max(120).default(''),
  labourRatePerHour: z.number().min(0).max(100000).default(0),
  currency: z.string().trim().min(1).max(8).default('EUR'),
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
  settings: workshopSettings.partial().optional(),
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
