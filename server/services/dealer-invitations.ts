// A dealer's request for access to a farm: a pending link whose single-use token is e-mailed to
// the farm's manager, who accepts it for one of their farms (or the dealer withdraws it).
import { Op, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { env } from '../env';
import { AppError, invalid, notFound } from '../errors';
import { DealerLink, Organization, User } from '../models';
import type { AuthContext, OrgAccess } from '../policies/context';
import {
  DEALER_ACCESS_DESCRIPTIONS,
  DEALER_ACCESS_LABELS,
  type CustomerInvitationInput,
  type DealerInvitationAcceptInput,
} from '../../shared/schemas/dealers';
import { ROLE_LABELS } from '../../shared/constants';
import { queueMessage } from '../infra/mailer';
import { hashToken, newToken } from '../infra/tokens';
import { assertNotLinked, auditLink } from './dealer-links';

export const DEALER_INVITATION_DAYS = 14;

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
    await auditLink(
      access,
      dealer.id,
      'dealer_link.request',
      row,
      { email: input.email },
      transaction,
    );
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
          `${advisor ? `${advisor.name} (${advisor.email}), ${ROLE_LABELS.advisor.toLowerCase()} at ${dealer.name},` : `A ${ROLE_LABELS.advisor.toLowerCase()} at ${dealer.name}`} asks for access to your farm's machines on Hourstone, to see what is coming due and propose service dates.`,
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
    await auditLink(access, access.organization.id, 'dealer_link.withdraw', link, {}, transaction);
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

/**
 * A dealer's open request as the farm manager who opened its link sees it: the farms they manage
 * and which of those the dealer reaches already.
 */
export async function describeDealerInvitation(auth: AuthContext, token: string) {
  const link = await findOpenDealerInvitation(token);
  const farms = managedFarms(auth);
  const live = farms.length
    ? await DealerLink.findAll({
        where: {
          dealerOrganizationId: link.dealerOrganizationId,
          status: 'active',
          farmOrganizationId: farms.map((f) => f.id),
        },
        attributes: ['farmOrganizationId'],
      })
    : [];
  return { link, farms, linkedFarmIds: new Set(live.map((l) => l.farmOrganizationId)) };
}

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
    await auditLink(
      access,
      farm.id,
      'dealer_link.accept',
      link,
      { access: input.access },
      transaction,
    );
    return { link, farm };
  });
}
