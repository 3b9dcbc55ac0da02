import { z } from 'zod';
import { ROLES } from '../roles';
import { uuid } from './common';

/** 8–128 characters; the server pre-hashes so bcrypt's 72-byte limit never truncates. */
export const passwordSchema = z
  .string()
  .min(8, 'Use at least 8 characters')
  .max(128, 'Use at most 128 characters');
export const emailSchema = z
  .email('Enter a valid e-mail address')
  .max(254)
  .transform((s) => s.toLowerCase());
export const personNameSchema = z.string().trim().min(1, 'Enter a name').max(120);

export const signUpRequest = z.object({
  workshopName: z.string().trim().min(2, 'Enter the workshop name').max(120),
  name: personNameSchema,
  email: emailSchema,
  password: passwordSchema,
});
export type SignUpRequest = z.infer<typeof signUpRequest>;

export const signInRequest = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password').max(128),
});
export type SignInRequest = z.infer<typeof signInRequest>;

export const membershipSummary = z.object({
  id: uuid,
  workshopId: uuid,
  workshopName: z.string(),
  role: z.enum(ROLES),
});
export type MembershipSummary = z.infer<typeof membershipSummary>;

export const userSummary = z.object({
  id: uuid,
  name: z.string(),
  email: z.string(),
  /** Whether the reminder job e-mails this person a digest of their due re-checks. */
  remindersEnabled: z.boolean().optional(),
});
export type UserSummary = z.infer<typeof userSummary>;

/**
 * GET /api/auth/session, and the body of a successful sign-up / sign-in / accept.
 * `token` is for Bearer clients; the web client uses the httpOnly cookie and sends
 * `csrfToken` back in the `x-csrf-token` header on POST/PATCH/PUT/DELETE.
 */
export const sessionResponse = z.object({
  user: userSummary,
  memberships: z.array(membershipSummary),
  csrfToken: z.string(),
  token: z.string().optional(),
});
export type SessionResponse = z.infer<typeof sessionResponse>;

/** PATCH /api/auth/preferences: the signed-in person's own settings; answers like GET session. */
export const updatePreferencesRequest = z.object({
  remindersEnabled: z.boolean(),
});
export type UpdatePreferencesRequest = z.infer<typeof updatePreferencesRequest>;

export const invitationPreview = z.object({
  workshopName: z.string(),
  email: z.string(),
  role: z.enum(ROLES),
  invitedBy: z.string(),
  expiresAt: z.string(),
});
export type InvitationPreview = z.infer<typeof invitationPreview>;

export const acceptInvitationRequest = z.object({
  name: personNameSchema,
  password: passwordSchema,
});
export type AcceptInvitationRequest = z.infer<typeof acceptInvitationRequest>;
