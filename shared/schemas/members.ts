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

// Views of the member list the client builds for its forms (no endpoint answers them as such):
// derived from memberSchema so they cannot drift from it.
const memberUser = memberSchema.shape.user;

/** An operator of the farm, for assigning machines. */
export const operatorChoiceSchema = z.object({
  userId: memberUser.shape.id,
  name: memberUser.shape.name,
});
export type Operator = z.infer<typeof operatorChoiceSchema>;

/** A member who may be named on a service record: the farm's technicians and managers. */
export const shopPersonSchema = operatorChoiceSchema.extend({
  role: z.enum(['manager', 'technician']),
});
export type ShopPerson = z.infer<typeof shopPersonSchema>;

/** The farm's people by name, for "ask …" lines on an operator's screens. */
export const farmContactsSchema = z.object({
  /** who assigns machines to operators */
  managers: z.array(memberUser.shape.name),
  /** who may clear a tag-out: the farm's technicians and managers */
  shop: z.array(memberUser.shape.name),
});
export type FarmContacts = z.infer<typeof farmContactsSchema>;
