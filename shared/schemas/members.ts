import { z } from 'zod';
import { ROLES } from '../constants';

// The responses of an organization's members and invitations; their requests
// (invitationCreateSchema, membershipUpdateSchema) live in auth.ts.

export const memberSchema = z
  .object({
    id: z.string(),
    role: z.enum(ROLES),
    user: z.object({ id: z.string(), name: z.string(), email: z.string() }),
    abilities: z.object({ update: z.boolean(), remove: z.boolean() }),
  })
  .meta({ id: 'Member' });
export type Member = z.infer<typeof memberSchema>;

export const memberListResponseSchema = z.object({
  data: z.array(memberSchema),
  abilities: z.object({ invite: z.boolean() }),
});
export type MemberList = z.infer<typeof memberListResponseSchema>;
export const memberResponseSchema = z.object({ data: memberSchema });
export type MemberResponse = z.infer<typeof memberResponseSchema>;

/** An invitation not yet accepted (ISO timestamps). */
export const invitationSchema = z
  .object({
    id: z.string(),
    email: z.string(),
    name: z.string(),
    role: z.enum(ROLES),
    expiresAt: z.string(),
    createdAt: z.string(),
  })
  .meta({ id: 'Invitation' });
export type PendingInvitation = z.infer<typeof invitationSchema>;

export const invitationListResponseSchema = z.object({ data: z.array(invitationSchema) });
export type InvitationListResponse = z.infer<typeof invitationListResponseSchema>;
export const invitationResponseSchema = z.object({ data: invitationSchema });
export type InvitationResponse = z.infer<typeof invitationResponseSchema>;
