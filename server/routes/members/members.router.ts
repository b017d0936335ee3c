import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { invitationCreateSchema, membershipUpdateSchema } from '../../../shared/schemas/auth';
import { Invitation, Membership, User } from '../../models';
import { notFound, invalid } from '../../errors';
import { authorize } from '../../policies/access';
import {
  canInviteMembers,
  canListMembers,
  canRemoveMember,
  canUpdateMember,
  rolesFor,
} from '../../policies/membership';
import { presentInvitation, presentMember } from '../../presenters/membership';
import {
  invitationListResponseSchema,
  invitationResponseSchema,
  memberListResponseSchema,
  memberResponseSchema,
} from '../../../shared/schemas/members';
import { inviteMember } from '../../services/accounts';
import { recordAudit } from '../../infra/audit';
import { revokePersonalFeeds } from '../../services/calendar';
import { sequelize } from '../../db';
import type { OrgAccess } from '../../policies/access';

const orgParams = z.object({ orgId: z.uuid() });
const memberParams = orgParams.extend({ id: z.uuid() });

async function findMember(access: OrgAccess, id: string) {
  const member = await Membership.findOne({
    where: { id, organizationId: access.organization.id },
    include: [{ model: User, as: 'user' }],
  });
  if (!member) throw notFound('Member');
  return member;
}

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
      const members = await Membership.findAll({
        where: { organizationId: access.organization.id },
        include: [{ model: User, as: 'user' }],
        order: [[{ model: User, as: 'user' }, 'name', 'ASC']],
      });
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
      const member = await findMember(access, params.id);
      authorize(
        canUpdateMember(access, member),
        'Only a manager may change roles, and not their own',
      );
      if (!rolesFor(access).includes(body.role)) {
        throw invalid({
          role: `Role must be one of: ${rolesFor(access).join(', ')} in this organization`,
        });
      }
      await sequelize.transaction(async (transaction) => {
        const before = member.role;
        await member.update({ role: body.role }, { transaction });
        await recordAudit(
          {
            organizationId: access.organization.id,
            actorUserId: access.userId,
            action: 'membership.update',
            entityType: 'membership',
            entityId: member.id,
            changes: { role: [before, body.role] },
          },
          transaction,
        );
      });
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
      const member = await findMember(access, params.id);
      authorize(
        canRemoveMember(access, member),
        'Only a manager may remove members, and not themselves',
      );
      await sequelize.transaction(async (transaction) => {
        await member.destroy({ transaction });
        await revokePersonalFeeds(access.organization.id, member.userId, transaction);
        await recordAudit(
          {
            organizationId: access.organization.id,
            actorUserId: access.userId,
            action: 'membership.remove',
            entityType: 'membership',
            entityId: member.id,
            changes: { userId: member.userId, role: member.role },
          },
          transaction,
        );
      });
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
      const rows = await Invitation.findAll({
        where: { organizationId: access.organization.id, acceptedAt: null },
        order: [['createdAt', 'DESC']],
      });
      return { data: rows.filter((r) => r.expiresAt > new Date()).map(presentInvitation) };
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
      const count = await Invitation.destroy({
        where: { id: params.id, organizationId: access.organization.id, acceptedAt: null },
      });
      if (!count) throw notFound('Invitation');
    },
  });

  return router;
}
