import { Op, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { env } from '../env';
import { AppError, invalid, notFound } from '../errors';
import { DealerLink, Membership, Organization, User } from '../models';
import type { AuthContext } from '../middlewares/auth';
import type { DealerAccessContext, OrgAccess } from '../policies/access';
import {
  DEALER_ACCESS_DESCRIPTIONS,
  DEALER_ACCESS_LABELS,
  type CustomerInvitationInput,
  type DealerAccess,
  type DealerInvitationAcceptInput,
  type DealerInvitationInput,
} from '../../shared/schemas/dealers';
import { recordAudit } from '../infra/audit';
import { queueMessage } from '../infra/mailer';
import { hashToken, newToken } from '../infra/tokens';

export const DEALER_INVITATION_DAYS = 14;

/**
 * The caller's access to a farm through an active link of a dealer they advise, or null. Looked
 * up on every request (no cache), so a revoked or changed link takes effect on the next one.
 * Where two of the caller's dealers link the same farm, the wider access wins.
 */
export async function findDealerAccess(
  auth: AuthContext,
  farmId: string,
): Promise<DealerAccessContext | null> {
  const dealerIds = auth.memberships
    .filter((m) => m.role === 'advisor' && m.organization?.kind === 'dealer')
    .map((m) => m.organizationId);
  if (!dealerIds.length) return null;
  const links = await DealerLink.findAll({
    where: {
      farmOrganizationId: farmId,
      status: 'active',
      dealerOrganizationId: { [Op.in]: dealerIds },
    },
    include: [{ model: Organization, as: 'farm' }],
  });
  const link = links.find((l) => l.access === 'service') ?? links[0];
  if (!link?.farm || link.farm.kind !== 'farm') return null;
  return dealerAccessFor(link, link.farm, auth.user.id);
}

/** The access a dealer's advisor has to a linked farm, for services that work per farm. */
export const dealerAccessFor = (
  link: DealerLink,
  farm: Organization,
  userId: string,
): DealerAccessContext => ({
  organization: farm,
  userId,
  role: 'advisor',
  via: 'dealer',
  dealerAccess: link.access,
  dealerOrganizationId: link.dealerOrganizationId,
  dealerLinkId: link.id,
});

/** Records one read of farm data by a dealer in the farm's audit log (action 'dealer.read'). */
export async function recordDealerRead(
  access: DealerAccessContext,
  read: { entityType: string; entityId?: string | null; path: string },
  transaction?: Transaction,
) {
  await recordAudit(
    {
      organizationId: access.organization.id,
      actorUserId: access.userId,
      action: 'dealer.read',
      entityType: read.entityType,
      entityId: read.entityId ?? null,
      changes: {
        path: read.path,
        dealerOrganizationId: access.dealerOrganizationId,
        access: access.dealerAccess,
      },
    },
    transaction,
  );
}

/** The active links of a dealer with their farms (optionally one customer), by farm name. */
export async function activeLinks(dealerId: string, customerId?: string) {
  const links = await DealerLink.findAll({
    where: {
      dealerOrganizationId: dealerId,
      status: 'active',
      ...(customerId && { farmOrganizationId: customerId }),
    },
    include: [{ model: Organization, as: 'farm' }],
  });
  return links
    .filter((l) => l.farm?.kind === 'farm')
    .sort((a, b) => a.farm!.name.localeCompare(b.farm!.name));
}

/** The active link between this dealer and customer, or 422 naming the field. */
export async function requireCustomer(dealerId: string, customerId: string, field = 'customerId') {
  const [link] = await activeLinks(dealerId, customerId);
  if (!link) throw invalid({ [field]: 'Not one of your linked customers' });
  return link;
}

const audit = (
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

/**
 * A dealer asks a farm for access: a pending link and a single-use link e-mailed to the farm's
 * manager. The farm is unknown until the manager picks it when accepting.
 */
export async function inviteCustomer(access: OrgAccess, input: CustomerInvitationInput) {
  const dealer = access.organization;
  const { token, hash } = newToken();
  const advisor = await User.findByPk(access.userId, { attributes: ['name', 'email'] });
  const url = `${env.APP_URL.replace(/\/+$/, '')}/dealer-invitations/${token}`;
  return sequelize.transaction(async (transaction) => {
    const row = await DealerLink.create(
      {
        dealerOrganizationId: dealer.id,
        farmOrganizationId: null,
        access: 'view',
        status: 'pending',
        initiatedBy: 'dealer',
        invitedBy: access.userId,
        invitedEmail: input.email,
        message: input.message,
        tokenHash: hash,
        expiresAt: new Date(Date.now() + DEALER_INVITATION_DAYS * 86_400_000),
        acceptedBy: null,
        acceptedAt: null,
        revokedBy: null,
        revokedAt: null,
      },
      { transaction },
    );
    await audit(access, dealer.id, 'dealer_link.request', row, { email: input.email }, transaction);
    await queueMessage(
      {
        organizationId: dealer.id,
        recipient: input.email,
        kind: 'dealer_link_request',
        periodKey: row.id,
        subject: `${dealer.name} asks to see your machines on Hourstone`,
        text: [
          'Hello,',
          '',
          `${advisor?.name ?? 'A service advisor'} at ${dealer.name} asks for access to your farm's machines on Hourstone, to see what is coming due and propose service dates.`,
          ...(input.message ? ['', input.message] : []),
          '',
          'As the farm manager you choose the access, and you can change or revoke it at any time:',
          `- ${DEALER_ACCESS_LABELS.view}: ${DEALER_ACCESS_DESCRIPTIONS.view}`,
          `- ${DEALER_ACCESS_LABELS.service}: ${DEALER_ACCESS_DESCRIPTIONS.service}`,
          '',
          `Sign in and answer here (the link works once and expires in ${DEALER_INVITATION_DAYS} days):`,
          url,
          '',
          'If you did not expect this, ignore this message: nothing is shared unless you accept.',
        ].join('\n'),
        headers: advisor ? { 'Reply-To': advisor.email } : undefined,
      },
      transaction,
    );
    return row;
  });
}

/** Withdraws a dealer's pending request. */
export async function withdrawCustomerInvitation(access: OrgAccess, linkId: string) {
  const link = await DealerLink.findOne({
    where: { id: linkId, dealerOrganizationId: access.organization.id, status: 'pending' },
  });
  if (!link) throw notFound('Invitation');
  await sequelize.transaction(async (transaction) => {
    await link.update(
      { status: 'revoked', revokedBy: access.userId, revokedAt: new Date(), tokenHash: null },
      { transaction },
    );
    await audit(access, access.organization.id, 'dealer_link.withdraw', link, {}, transaction);
  });
}

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

async function assertNotLinked(farmId: string, dealerId: string, transaction?: Transaction) {
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
    await audit(access, farm.id, 'dealer_link.grant', row, { access: input.access }, transaction);
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
          `${farm.name} has given ${dealer.name} ${DEALER_ACCESS_LABELS[input.access].toLowerCase()} access to its machines on Hourstone.`,
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
    await audit(
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
    await audit(access, access.organization.id, 'dealer_link.revoke', link, {}, transaction);
    return link;
  });
}

/** A dealer's pending request for this token, or 404 (used, withdrawn or expired). */
export async function findOpenDealerInvitation(token: string, transaction?: Transaction) {
  const link = await DealerLink.findOne({
    where: { tokenHash: hashToken(token), status: 'pending', expiresAt: { [Op.gt]: new Date() } },
    include: [{ model: Organization, as: 'dealer' }],
    transaction,
    ...(transaction && { lock: { level: transaction.LOCK.UPDATE, of: DealerLink } }),
  });
  if (!link)
    throw new AppError(404, 'not_found', 'This request has expired, was withdrawn or was answered');
  return link;
}

/** The farms the signed-in person manages, as accepting a dealer's request offers them. */
export const managedFarms = (auth: AuthContext) =>
  auth.memberships
    .filter((m) => m.role === 'manager' && m.organization?.kind === 'farm')
    .map((m) => m.organization!);

/** The farm manager accepts a dealer's request for one of their farms, choosing the access. */
export async function acceptDealerInvitation(
  auth: AuthContext,
  token: string,
  input: DealerInvitationAcceptInput,
) {
  const farm = managedFarms(auth).find((f) => f.id === input.organizationId);
  if (!farm) throw invalid({ organizationId: 'Choose a farm you manage' });
  return sequelize.transaction(async (transaction) => {
    const link = await findOpenDealerInvitation(token, transaction);
    await assertNotLinked(farm.id, link.dealerOrganizationId, transaction);
    await link.update(
      {
        farmOrganizationId: farm.id,
        access: input.access,
        status: 'active',
        tokenHash: null,
        acceptedBy: auth.user.id,
        acceptedAt: new Date(),
      },
      { transaction },
    );
    const access: OrgAccess = {
      organization: farm,
      userId: auth.user.id,
      role: 'manager',
      via: 'member',
    };
    await audit(access, farm.id, 'dealer_link.accept', link, { access: input.access }, transaction);
    return { link, farm };
  });
}
