// How a dealer's advisor reaches a farm: the access of an active link, the dealer's active
// links, and the audit of each read. The request path (middlewares/org-access.ts) uses this, so
// it stays clear of the mailer.
import { Op, type Transaction } from 'sequelize';
import { invalid } from '../errors';
import { DealerLink, Organization } from '../models';
import type { AuthContext, DealerAccessContext } from '../policies/context';
import { recordAudit } from '../infra/audit';
import { sequelize } from '../db';

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

/**
 * One 'dealer.read' audit row per farm (the same row recordDealerRead writes), in one statement:
 * a read across many customers (the board) is audited in each farm's log without a write each.
 * Replacements :farmIds and :accesses (in step), :actor, :dealer, :entityType, :path.
 */
export const DEALER_READS_SQL = `INSERT INTO audit_events (organization_id, actor_user_id, action, entity_type, entity_id, changes)
  SELECT r.farm_id, :actor, 'dealer.read', :entityType, NULL,
    jsonb_build_object('path', CAST(:path AS text), 'dealerOrganizationId', CAST(:dealer AS text), 'access', r.access)
  FROM unnest(ARRAY[:farmIds]::uuid[], ARRAY[:accesses]::text[]) AS r(farm_id, access)`;

/** Records one read of each of these farms by the same dealer's advisor (see DEALER_READS_SQL). */
export async function recordDealerReads(
  accesses: DealerAccessContext[],
  read: { entityType: string; path: string },
) {
  if (!accesses.length) return;
  await sequelize.query(DEALER_READS_SQL, {
    replacements: {
      farmIds: accesses.map((a) => a.organization.id),
      accesses: accesses.map((a) => a.dealerAccess),
      actor: accesses[0].userId,
      dealer: accesses[0].dealerOrganizationId,
      entityType: read.entityType,
      path: read.path,
    },
  });
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
