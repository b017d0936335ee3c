import { z } from 'zod';
import { ORGANIZATION_KINDS, ROLES, UNIT_SYSTEMS } from '../constants';
import { email, password, personName, plainText } from './common';

export const signInSchema = z.object({
  email,
  password: z.string({ error: 'Enter your password' }).min(1, { error: 'Enter your password' }),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const roleSchema = z.enum(ROLES, { error: `Role must be one of: ${ROLES.join(', ')}` });

export const invitationCreateSchema = z.object({ email, name: personName, role: roleSchema });
export type InvitationCreateInput = z.infer<typeof invitationCreateSchema>;

export const invitationAcceptSchema = z.object({ name: personName, password });
export type InvitationAcceptInput = z.infer<typeof invitationAcceptSchema>;

export const passwordResetRequestSchema = z.object({ email });
export type PasswordResetRequestInput = z.infer<typeof passwordResetRequestSchema>;

export const passwordResetConfirmSchema = z.object({
  token: plainText(200, { required: 'The reset link is incomplete', untrimmed: true }).min(20, {
    error: 'The reset link is incomplete',
  }),
  password,
});
export type PasswordResetConfirmInput = z.infer<typeof passwordResetConfirmSchema>;

/** A signed-in person's new password, with the current one. */
export const passwordChangeSchema = z.object({
  currentPassword: z
    .string({ error: 'Enter your current password' })
    .min(1, { error: 'Enter your current password' })
    .max(200, { error: 'Use at most 200 characters' }),
  password,
});
export type PasswordChangeInput = z.infer<typeof passwordChangeSchema>;

/** Only the role; an unknown field is refused by name. */
export const membershipUpdateSchema = z.object({ role: roleSchema }).strict();
export type MembershipUpdateInput = z.infer<typeof membershipUpdateSchema>;

// ── Responses ────────────────────────────────────────────────────────────────────────────────

/** An organization as the session lists it (the switcher, the home page). */
export const organizationSummarySchema = z
  .object({
    id: z.string(),
    name: z.string(),
    kind: z.enum(ORGANIZATION_KINDS),
    timeZone: z.string(),
    units: z.enum(UNIT_SYSTEMS),
    /** ISO 4217: money amounts of this organization are integer minor units of it */
    currency: z.string(),
  })
  .meta({ id: 'OrganizationSummary' });
export type OrganizationSummary = z.infer<typeof organizationSummarySchema>;

/** The signed-in person and the organizations they belong to, with their role in each. */
export const meSchema = z
  .object({
    user: z.object({ id: z.string(), email: z.string(), name: z.string() }),
    memberships: z.array(
      z.object({ id: z.string(), role: z.enum(ROLES), organization: organizationSummarySchema }),
    ),
  })
  .meta({ id: 'Me' });
export type Me = z.infer<typeof meSchema>;

/** GET /auth/me, sign-in, and every step that ends signed in. */
export const meResponseSchema = z.object({ data: meSchema });
export type MeResponse = z.infer<typeof meResponseSchema>;

/**
 * GET /session: whether this browser is signed in, and as whom. Always 200, so a signed-out visit
 * asks without an error (the browser logs every 401 on the console); GET /me stays 401.
 */
export const sessionProbeResponseSchema = z.object({
  data: z.union([
    z.object({ signedIn: z.literal(true), me: meSchema }),
    z.object({ signedIn: z.literal(false) }).strict(),
  ]),
});
export type SessionProbe = z.infer<typeof sessionProbeResponseSchema>['data'];

/** A request that sends an e-mail (answered alike whether or not the address has an account). */
export const mailSentResponseSchema = z.object({ data: z.object({ sent: z.boolean() }) });
export type MailSentResponse = z.infer<typeof mailSentResponseSchema>;

/** GET an invitation by its token: whom it invites, to what, as what. */
export const invitationLookupSchema = z.object({
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
  organization: z.object({ id: z.string(), name: z.string(), kind: z.enum(ORGANIZATION_KINDS) }),
});
export type InvitationLookup = z.infer<typeof invitationLookupSchema>;
export const invitationLookupResponseSchema = z.object({ data: invitationLookupSchema });
export type InvitationLookupResponse = z.infer<typeof invitationLookupResponseSchema>;
