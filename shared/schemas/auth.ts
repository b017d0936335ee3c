import { z } from 'zod';
import { ROLES } from '../constants';
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
