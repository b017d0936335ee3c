import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { invitationCreateSchema, membershipUpdateSchema } from '../../../shared/schemas/auth';
import type { Membership } from '../../models';
import { authorize } from '../../policies/access';
import {
  canInviteMembers,
  canListMembers,
  canRemoveMember,
  canUpdateMember,
} from '../../policies/membership';
import { presentInvitation, presentMember } from '../../presenters/membership';
import {
  invitationListResponseSchema,
  invitationResponseSchema,
  memberListResponseSchema,
  memberResponseSchema,
} from '../../../shared/schemas/members';
import { inviteMember } from '../../services/accounts';
import {
  changeMemberRole,
  listMembers,
  loadMember,
  pendingInvitations,
  removeMember,
  withdrawInvitation,
} from '../../services/members';
import type { OrgAccess } from '../../policies/access';

const orgParams = z.object({ orgId: z.uuid() });
const memberParams = orgParams.extend({ id: z.uuid() });

const abilitiesOf = (access: OrgAccess, m: Membership) => ({
  update: canUpdateMember(access, m),
  remove: canRemoveMember(access, m),
});

export function membersRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/members',
    summary: 'Members of the organization with their roles',
    tags: ['members'],
    params: orgParams,
    response: memberListResponseSchema,
    handler: async ({ req }) => {
      const access = req.access!;
      authorize(canListMembers(access));
      const members = await listMembers(access);
      return {
        data: members.map((m) => presentMember(m, abilitiesOf(access, m))),
        abilities: { invite: canInviteMembers(access) },
      };
    },
  });

  route(router, {
    method: 'patch',
    path: '/organizations/:orgId/members/:id',
    summary: "Change a member's role",
    tags: ['members'],
    params: memberParams,
    body: membershipUpdateSchema,
    response: memberResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const member = await loadMember(access, params.id);
      authorize(
        canUpdateMember(access, member),
        'Only a manager may change roles, and not their own',
      );
      await changeMemberRole(access, member, body.role);
      return { data: presentMember(member, abilitiesOf(access, member)) };
    },
  });

  route(router, {
    method: 'delete',
    path: '/organizations/:orgId/members/:id',
    summary: 'Remove a member from the organization',
    tags: ['members'],
    params: memberParams,
    status: 204,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const member = await loadMember(access, params.id);
      authorize(
        canRemoveMember(access, member),
        'Only a manager may remove members, and not themselves',
      );
      await removeMember(access, member);
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/invitations',
    summary: 'Pending invitations',
    tags: ['members'],
    params: orgParams,
    response: invitationListResponseSchema,
    handler: async ({ req }) => {
      const access = req.access!;
      authorize(canInviteMembers(access));
      return { data: (await pendingInvitations(access)).map(presentInvitation) };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/invitations',
    summary: 'Invite a person by e-mail (sends a single-use link)',
    tags: ['members'],
    params: orgParams,
    body: invitationCreateSchema,
    status: 201,
    response: invitationResponseSchema,
    handler: async ({ req, body }) => {
      const access = req.access!;
      authorize(canInviteMembers(access), 'Only a manager may invite people');
      return { data: presentInvitation(await inviteMember(access, body)) };
    },
  });

  route(router, {
    method: 'delete',
    path: '/organizations/:orgId/invitations/:id',
    summary: 'Withdraw a pending invitation',
    tags: ['members'],
    params: memberParams,
    status: 204,
    handler: async ({ req, params }) => {
      const access = req.access!;
      authorize(canInviteMembers(access), 'Only a manager may withdraw invitations');
      await withdrawInvitation(access, params.id);
    },
  });

  return router;
}
