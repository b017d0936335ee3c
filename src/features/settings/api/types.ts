import type { Role } from '../../../../shared/constants';

export interface Member {
  id: string;
  role: Role;
  user: { id: string; name: string; email: string };
  abilities: { update: boolean; remove: boolean };
}

export interface MemberList {
  data: Member[];
  abilities: { invite: boolean };
}

export interface PendingInvitation {
  id: string;
  email: string;
  name: string;
  role: Role;
  expiresAt: string;
  createdAt: string;
}
