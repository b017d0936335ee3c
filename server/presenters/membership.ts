import { z } from 'zod';
import type { Invitation, Membership } from '../models';
import { ROLES } from '../../shared/constants';

export const memberSchema = z
  .object({
    id: z.string(),
    role: z.enum(ROLES),
    user: z.object({ id: z.string(), name: z.string(), email: z.string() }),
    abilities: z.object({ update: z.boolean(), remove: z.boolean() }),
  })
  .openapi('Member');

export function presentMember(m: Membership, abilities: { update: boolean; remove: boolean }) {
  return {
    id: m.id,
    role: m.role,
    user: { id: m.user!.id, name: m.user!.name, email: m.user!.email },
    abilities,
  };
}

export const invitationSchema = z
  .object({
    id: z.string(),
    email: z.string(),
    name: z.string(),
    role: z.enum(ROLES),
    expiresAt: z.string(),
    createdAt: z.string(),
  })
  .openapi('Invitation');

export const presentInvitation = (i: Invitation) => ({
  id: i.id,
  email: i.email,
  name: i.name,
  role: i.role,
  expiresAt: i.expiresAt.toISOString(),
  createdAt: i.createdAt.toISOString(),
});
