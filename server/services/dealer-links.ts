// A farm's dealer links as the farm manages them (grant, change, revoke) and a dealer's list of
// customers. Dealer requests answered by e-mailed link are in dealer-invitations.ts; how a link
// gives access on each request is in dealer-access.ts.
import { Op, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { env } from '../env';
import { AppError, invalid, notFound } from '../errors';
import { DealerLink, Membership, Organization, User } from '../models';
import type { OrgAccess } from '../policies/context';
import {
  DEALER_ACCESS_DESCRIPTIONS,
  DEALER_ACCESS_LABELS,
  type DealerAccess,
  type DealerInvitationInput,
} from '../../shared/schemas/dealers';
import { recordAudit } from '../infra/audit';
import { queueMessage } from '../infra/mailer';

/** Records a change of a dealer link in an organization's audit log. */
export const auditLink = (
  access: OrgAccess,
  organizationId: string,
  action: string,
  link: DealerLink,
  changes: Record<string, unknown>,
  transaction?: Transaction,
) =>
  recordAudit(
    {
      organizationId,
      actorUserId: access.userId,
      action,
      entityType: 'dealer_link',
      entityId: link.id,
      changes: { dealerOrganizationId: link.dealerOrganizationId, ...changes },
    },
    transaction,
  );

const byEmail = (column: string, value: string) =>
  sequelize.where(sequelize.fn('lower', sequelize.col(column)), value.toLowerCase());

/** A dealer's customers (active links) and its requests still waiting for an answer. */
export async function listCustomers(access: OrgAccess) {
  const links = await DealerLink.findAll({
    where: {
      dealerOrganizationId: access.organization.id,
      [Op.or]: [{ status: 'active' }, { status: 'pending', expiresAt: { [Op.gt]: new Date() } }],
    },
    include: [{ model: Organization, as: 'farm' }],
    order: [['createdAt', 'DESC']],
  });
  const farmIds = links.flatMap((l) => (l.farmOrganizationId ? [l.farmOrganizationId] : []));
  const counts = farmIds.length
    ? ((await sequelize.query(
        `SELECT organization_id, count(*)::int AS n FROM machines
         WHERE organization_id IN (:ids) AND status <> 'sold' GROUP BY organization_id`,
        { replacements: { ids: farmIds }, type: 'SELECT' },
      )) as { organization_id: string; n: number }[])
    : [];
  const machines = new Map(counts.map((c) => [c.organization_id, c.n]));
  return links.map((l) => ({
    link: l,
    machineCount: machines.get(l.farmOrganizationId ?? '') ?? 0,
  }));
}

/** A farm's dealers: active links first, then the revoked ones (history). */
export async function listFarmDealers(access: OrgAccess) {
  return DealerLink.findAll({
    where: {
      farmOrganizationId: access.organization.id,
      status: { [Op.in]: ['active', 'revoked'] },
    },
    include: [{ model: Organization, as: 'dealer' }],
    order: [
      ['status', 'ASC'],
      ['acceptedAt', 'DESC'],
    ],
  });
}

/** The dealers a farm has linked, once each (for the audit log's dealer filter). */
export async function farmDealerChoices(access: OrgAccess) {
  const links = await listFarmDealers(access);
  return [
    ...new Map(links.map((l) => [l.dealerOrganizationId, l.dealer?.name ?? ''])).entries(),
  ].map(([id, name]) => ({ id, name }));
}

/** 409 while this dealer has an active link to the farm already. */
export async function assertNotLinked(farmId: string, dealerId: string, transaction?: Transaction) {
  const live = await DealerLink.findOne({
    where: { farmOrganizationId: farmId, dealerOrganizationId: dealerId, status: 'active' },
    include: [{ model: Organization, as: 'dealer' }],
    transaction,
  });
  if (live)
    throw new AppError(
      409,
      'already_linked',
      `${live.dealer?.name ?? 'This dealer'} has access already: change it on the Dealers page`,
    );
}

/**
 * A farm manager grants a dealer access by one of its advisors' e-mail. The manager's choice is
 * the acceptance: the link is active at once, and the advisor is told by e-mail.
 */
export async function grantDealer(access: OrgAccess, input: DealerInvitationInput) {
  const farm = access.organization;
  const advisor = await User.findOne({ where: byEmail('email', input.email) });
  const membership = advisor
    ? await Membership.findOne({
        where: { userId: advisor.id, role: 'advisor' },
        include: [{ model: Organization, as: 'organization', where: { kind: 'dealer' } }],
        order: [['createdAt', 'ASC']],
      })
    : null;
  if (!advisor || !membership?.organization)
    throw invalid({ email: 'No dealer service advisor on Hourstone has this e-mail' });
  const dealer = membership.organization;
  const manager = await User.findByPk(access.userId, { attributes: ['name', 'email'] });
  const link = await sequelize.transaction(async (transaction) => {
    await assertNotLinked(farm.id, dealer.id, transaction);
    const row = await DealerLink.create(
      {
        dealerOrganizationId: dealer.id,
        farmOrganizationId: farm.id,
        access: input.access,
        status: 'active',
        initiatedBy: 'farm',
        invitedBy: access.userId,
        invitedEmail: input.email,
        tokenHash: null,
        expiresAt: null,
        acceptedBy: access.userId,
        acceptedAt: new Date(),
        revokedBy: null,
        revokedAt: null,
      },
      { transaction },
    );
    await auditLink(
      access,
      farm.id,
      'dealer_link.grant',
      row,
      { access: input.access },
      transaction,
    );
    await queueMessage(
      {
        organizationId: farm.id,
        recipient: advisor.email,
        kind: 'dealer_link_granted',
        periodKey: row.id,
        subject: `${farm.name} linked its machines to ${dealer.name} on Hourstone`,
        text: [
          `Hello ${advisor.name},`,
          '',
          `${manager ? `${manager.name} (${manager.email}), manager of ${farm.name},` : farm.name} has given ${dealer.name} ${DEALER_ACCESS_LABELS[input.access].toLowerCase()} access to ${farm.name}'s machines on Hourstone.`,
          DEALER_ACCESS_DESCRIPTIONS[input.access],
          '',
          `Their machines now show on your board: ${env.APP_URL.replace(/\/+$/, '')}/o/${dealer.id}/board`,
        ].join('\n'),
      },
      transaction,
    );
    return row;
  });
  link.dealer = dealer;
  return link;
}

/** A link of this farm, or 404. */
async function loadFarmLink(access: OrgAccess, linkId: string, transaction?: Transaction) {
  const link = await DealerLink.findOne({
    where: { id: linkId, farmOrganizationId: access.organization.id },
    include: [{ model: Organization, as: 'dealer' }],
    transaction,
    ...(transaction && { lock: { level: transaction.LOCK.UPDATE, of: DealerLink } }),
  });
  if (!link) throw notFound('Dealer link');
  return link;
}

export async function changeLinkAccess(access: OrgAccess, linkId: string, wanted: DealerAccess) {
  return sequelize.transaction(async (transaction) => {
    const link = await loadFarmLink(access, linkId, transaction);
    if (link.status !== 'active')
      throw new AppError(409, 'not_active', 'This link is revoked: link the dealer again instead');
    const before = link.access;
    await link.update({ access: wanted }, { transaction });
    await auditLink(
      access,
      access.organization.id,
      'dealer_link.update',
      link,
      { access: [before, wanted] },
      transaction,
    );
    return link;
  });
}

/** Revokes a link: the dealer's next request to the farm answers 404. */
export async function revokeLink(access: OrgAccess, linkId: string) {
  return sequelize.transaction(async (transaction) => {
    const link = await loadFarmLink(access, linkId, transaction);
    if (link.status !== 'active')
      throw new AppError(409, 'not_active', 'This link is revoked already');
    await link.update(
      { status: 'revoked', revokedBy: access.userId, revokedAt: new Date() },
      { transaction },
    );
    await auditLink(access, access.organization.id, 'dealer_link.revoke', link, {}, transaction);
    return link;
  });
}
