// Organizations of one's own: creating a farm or a dealer (its creator runs it), changing its
// settings, and deleting it with every row and stored file it has, after telling those linked
// with it. Also who is the last manager of what (an account cannot leave an organization
// without one).
import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { invalid } from '../errors';
import { logger } from '../logger';
import { Invitation, Membership, Organization } from '../models';
import {
  FARM_ONLY_FIELDS,
  type OrganizationCreateInput,
  type OrganizationUpdateInput,
} from '../../shared/schemas/organizations';
import type { OrgAccess } from '../policies/access';
import { managingRole } from '../policies/organization';
import { inviteMember } from './accounts';
import { organizationDeletedMail } from './account-mail';
import { recordAudit } from '../infra/audit';
import { refreshOrganizationForecasts } from './forecast';
import { queueMessage } from '../infra/mailer';
import { deleteObject, listObjectKeys } from '../infra/storage';

/** Creates the organization and makes its creator the manager (a dealer's: its advisor). */
export async function createOrganization(
  creatorId: string | null,
  input: OrganizationCreateInput,
  transaction?: Transaction,
): Promise<Organization> {
  const work = async (t: Transaction) => {
    const organization = await Organization.create(
      input.kind === 'farm'
        ? { ...input }
        : {
            kind: 'dealer',
            name: input.name,
            timeZone: input.timeZone,
            currency: input.currency,
            units: input.units,
          },
      { transaction: t },
    );
    if (creatorId) {
      await Membership.create(
        { organizationId: organization.id, userId: creatorId, role: managingRole(input.kind) },
        { transaction: t },
      );
    }
    await recordAudit(
      {
        organizationId: organization.id,
        actorUserId: creatorId,
        action: 'organization.create',
        entityType: 'organization',
        entityId: organization.id,
        changes: { kind: input.kind, name: input.name },
      },
      t,
    );
    return organization;
  };
  return transaction ? work(transaction) : sequelize.transaction(work);
}

/** Changes the settings sent; a dealer refuses the farm's own settings by name. */
export async function updateOrganization(
  access: OrgAccess,
  input: OrganizationUpdateInput,
): Promise<Organization> {
  const organization = access.organization;
  if (organization.kind === 'dealer') {
    const farmOnly = FARM_ONLY_FIELDS.filter((field) => input[field] !== undefined);
    if (farmOnly.length) {
      throw invalid(
        Object.fromEntries(farmOnly.map((f) => [f, 'Only a farm has this setting, not a dealer'])),
      );
    }
  }
  const changes: Record<string, [unknown, unknown]> = {};
  for (const [field, value] of Object.entries(input) as [keyof OrganizationUpdateInput, never][]) {
    if (value === undefined) continue;
    const before = organization.get(field);
    if (JSON.stringify(before) !== JSON.stringify(value)) changes[field] = [before, value];
  }
  if (!Object.keys(changes).length) return organization;
  await sequelize.transaction(async (transaction) => {
    await organization.update(
      Object.fromEntries(Object.entries(changes).map(([field, [, value]]) => [field, value])),
      { transaction },
    );
    // machine summaries hold local days of the farm's zone: a new zone rebuilds them
    if (changes.timeZone)
      await refreshOrganizationForecasts(organization.id, {
        transaction,
        timeZone: organization.timeZone,
      });
    await recordAudit(
      {
        organizationId: organization.id,
        actorUserId: access.userId,
        action: 'organization.update',
        entityType: 'organization',
        entityId: organization.id,
        changes,
      },
      transaction,
    );
  });
  return organization;
}

interface Linked {
  organization_id: string;
  email: string;
  name: string;
}

/** Who runs the organizations linked with this one: a farm's dealers, a dealer's farms. */
function linkedPeople(organization: Organization, transaction: Transaction) {
  const [own, other, role] =
    organization.kind === 'farm'
      ? ['farm_organization_id', 'dealer_organization_id', 'advisor']
      : ['dealer_organization_id', 'farm_organization_id', 'manager'];
  return sequelize.query<Linked>(
    `SELECT DISTINCT l.${other} AS organization_id, u.email, u.name
     FROM dealer_links l
     JOIN memberships m ON m.organization_id = l.${other} AND m.role = :role
     JOIN users u ON u.id = m.user_id
     WHERE l.${own} = :id AND l.status = 'active' AND l.${other} IS NOT NULL
     ORDER BY u.email`,
    {
      replacements: { id: organization.id, role },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
}

/** The organization's files in the object store, all under one prefix. */
const filePrefix = (organizationId: string) => `org/${organizationId}/`;

/** Deletes every stored file of the organization; returns how many went. */
export async function deleteOrganizationFiles(organizationId: string): Promise<number> {
  let removed = 0;
  for await (const key of listObjectKeys(filePrefix(organizationId))) {
    await deleteObject(key);
    removed += 1;
  }
  return removed;
}

/**
 * Deletes the organization when `confirmName` is its name: every row of it (the tables cascade
 * from organizations), then its stored files. Those linked with it are told in the same
 * transaction, through the outbox, in their own organization's name.
 */
export async function deleteOrganization(
  access: OrgAccess,
  confirmName: string,
): Promise<{ filesRemoved: number }> {
  const organization = access.organization;
  if (confirmName !== organization.name) {
    throw invalid({
      confirmName: `Type the organization's name exactly as it is written: ${organization.name}`,
    });
  }
  await sequelize.transaction(async (transaction) => {
    await Organization.findByPk(organization.id, { lock: transaction.LOCK.UPDATE, transaction });
    for (const person of await linkedPeople(organization, transaction)) {
      await queueMessage(
        {
          organizationId: person.organization_id,
          recipient: person.email,
          kind: 'organization_deleted',
          periodKey: organization.id,
          ...organizationDeletedMail(person.name, organization.name, organization.kind),
        },
        transaction,
      );
    }
    await Organization.destroy({ where: { id: organization.id }, transaction });
    await recordAudit(
      {
        organizationId: null,
        actorUserId: access.userId,
        action: 'organization.delete',
        entityType: 'organization',
        entityId: organization.id,
        changes: { kind: organization.kind, name: organization.name },
      },
      transaction,
    );
  });
  // After the commit: a file is never gone while its record is still there. A store that fails
  // here leaves files no record names, under a prefix the log gives for removing by hand.
  try {
    return { filesRemoved: await deleteOrganizationFiles(organization.id) };
  } catch (err) {
    logger.error(
      { err, prefix: filePrefix(organization.id) },
      'organization deleted, but removing its stored files failed',
    );
    return { filesRemoved: 0 };
  }
}

/**
 * The organizations this person runs alone: a farm where they are the only manager, a dealer
 * where they are the only advisor. By name.
 */
export async function lastManagedOrganizations(
  userId: string,
  transaction?: Transaction,
): Promise<{ id: string; name: string }[]> {
  return sequelize.query<{ id: string; name: string }>(
    `SELECT o.id, o.name FROM memberships m
     JOIN organizations o ON o.id = m.organization_id
     WHERE m.user_id = :userId
       AND m.role = CASE o.kind WHEN 'farm' THEN 'manager' ELSE 'advisor' END
       AND NOT EXISTS (SELECT 1 FROM memberships other
                       WHERE other.organization_id = m.organization_id
                         AND other.user_id <> m.user_id AND other.role = m.role)
     ORDER BY o.name, o.id`,
    { replacements: { userId }, type: QueryTypes.SELECT, transaction },
  );
}

/**
 * The self-hosting operator's way in (`npm run org:create`): a new organization with nobody in
 * it yet, and an invitation for its first manager (a dealer's: advisor) through the usual link.
 */
export async function createOrganizationWithInvitation(
  input: OrganizationCreateInput,
  manager: { email: string; name: string },
): Promise<{ organization: Organization; invitation: Invitation }> {
  const organization = await createOrganization(null, input);
  try {
    const invitation = await inviteMember(
      { organization, userId: null },
      { email: manager.email, name: manager.name, role: managingRole(input.kind) },
    );
    return { organization, invitation };
  } catch (error) {
    // No organization is left behind without a way for anyone to reach it.
    await Organization.destroy({ where: { id: organization.id } });
    throw error;
  }
}
