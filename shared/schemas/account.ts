import { z } from 'zod';
import { email, password, personName, plainText } from './common';

// Signing up and looking after one's own account. The password rules are the ones of a reset
// or an invitation (common.ts `password`).

export const signUpSchema = z.object({ name: personName, email, password }).strict();
export type SignUpInput = z.infer<typeof signUpSchema>;

const linkToken = plainText(200, { required: 'The link is incomplete', untrimmed: true }).min(20, {
  error: 'The link is incomplete',
});

/** The token of an e-mail confirmation link (a sign-up's or an address change's). */
export const emailTokenSchema = z.object({ token: linkToken }).strict();
export type EmailTokenInput = z.infer<typeof emailTokenSchema>;

const currentPassword = z
  .string({ error: 'Enter your current password' })
  .min(1, { error: 'Enter your current password' })
  .max(200, { error: 'Use at most 200 characters' });

/** Only the fields sent; an unknown field is refused by name. */
export const accountUpdateSchema = z.object({ name: personName }).partial().strict();
export type AccountUpdateInput = z.infer<typeof accountUpdateSchema>;

/** A new address, confirmed by a link sent to it before it takes the old one's place. */
export const emailChangeSchema = z.object({ email, currentPassword }).strict();
export type EmailChangeInput = z.infer<typeof emailChangeSchema>;

export const accountDeleteSchema = z.object({ currentPassword }).strict();
export type AccountDeleteInput = z.infer<typeof accountDeleteSchema>;

export const signUpStatusSchema = z.object({ open: z.boolean() });
export type SignUpStatus = z.infer<typeof signUpStatusSchema>;
export const signUpStatusResponseSchema = z.object({ data: signUpStatusSchema });
export type SignUpStatusResponse = z.infer<typeof signUpStatusResponseSchema>;

export const accountSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  /** the address waiting for its confirmation link, if a change was asked for */
  pendingEmail: z.string().nullable(),
  /** organizations the person is the last manager (or a dealer's last advisor) of */
  lastManagerOf: z.array(z.object({ id: z.string(), name: z.string() })),
});
export type Account = z.infer<typeof accountSchema>;
export const accountResponseSchema = z.object({ data: accountSchema });
export type AccountResponse = z.infer<typeof accountResponseSchema>;

/** An address change's link opened: the address the account signs in with from now on. */
export const emailChangedResponseSchema = z.object({ data: z.object({ email: z.string() }) });
export type EmailChangedResponse = z.infer<typeof emailChangedResponseSchema>;
