// An organization's members and pending invitations as its managers handle them. Sending an
// invitation is in accounts.ts (inviteMember), with the rest of the e-mailed links.
import { sequelize } from '../db';
import { invalid, notFound } from '../errors';
import { Invitation, Membership, User } from '../models';
import type { MembershipUpdateInput } from '../../shared/schemas/auth';
import type { OrgAccess } from '../policies/context';
import { rolesFor } from '../policies/membership';
import { recordAudit } from '../infra/audit';
import { revokePersonalFeeds } from './calendar';

/** A membership of the caller's organization with its user, or 404. */
export async function loadMember(access: OrgAccess, id: string) {
  const member = await Membership.findOne({
    where: { id, organizationId: access.organization.id },
    include: [{ model: User, as: 'user' }],
  });
  if (!member) throw notFound('Member');
  return member;
}

/** The organization's members with their users, by name. */
export async function listMembers(access: OrgAccess) {
  return Membership.findAll({
    where: { organizationId: access.organization.id },
    include: [{ model: User, as: 'user' }],
    order: [[{ model: User, as: 'user' }, 'name', 'ASC']],
  });
}

/** Gives a member another role of this kind of organization (422 otherwise); audited. */
export async function changeMemberRole(
  access: OrgAccess,
  member: Membership,
  role: MembershipUpdateInput['role'],
) {
  if (!rolesFor(access).includes(role)) {
    throw invalid({
      role: `Role must be one of: ${rolesFor(access).join(', ')} in this organization`,
    });
  }
  await sequelize.transaction(async (transaction) => {
    const before = member.role;
    await member.update({ role }, { transaction });
    await recordAudit(
      {
        organizationId: access.organization.id,
        actorUserId: access.userId,
        action: 'membership.update',
        entityType: 'membership',
        entityId: member.id,
        changes: { role: [before, role] },
      },
      transaction,
    );
  });
  return member;
}

/** Removes a member and their personal calendar feeds of this organization; audited. */
export async function removeMember(access: OrgAccess, member: Membership) {
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
}

/** Invitations not yet accepted nor expired, newest first. */
export async function pendingInvitations(access: OrgAccess) {
  const rows = await Invitation.findAll({
    where: { organizationId: access.organization.id, acceptedAt: null },
    order: [['createdAt', 'DESC']],
  });
  return rows.filter((r) => r.expiresAt > new Date());
}

/** Withdraws an invitation not yet accepted; 404 when there is none. */
export async function withdrawInvitation(access: OrgAccess, id: string) {
  const count = await Invitation.destroy({
    where: { id, organizationId: access.organization.id, acceptedAt: null },
  });
  if (!count) throw notFound('Invitation');
}
