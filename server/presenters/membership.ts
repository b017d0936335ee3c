import type { Invitation, Membership } from '../models';
import type { Member, PendingInvitation } from '../../shared/schemas/members';

export function presentMember(m: Membership, abilities: Member['abilities']): Member {
  return {
    id: m.id,
    role: m.role,
    user: { id: m.user!.id, name: m.user!.name, email: m.user!.email },
    abilities,
  };
}

export const presentInvitation = (i: Invitation): PendingInvitation => ({
  id: i.id,
  email: i.email,
  name: i.name,
  role: i.role,
  expiresAt: i.expiresAt.toISOString(),
  createdAt: i.createdAt.toISOString(),
});
