import { QueryTypes } from 'sequelize';
import { sequelize } from '../db';
import type { OrgAccess } from '../policies/access';
import type { AuditQuery } from '../../shared/schemas/dealers';

interface RawEvent {
  id: string;
  action: string;
  entity_type: string;
  entity_id: string | null;
  changes: Record<string, unknown>;
  created_at: Date;
  actor_id: string | null;
  actor_name: string | null;
  dealer_id: string | null;
  dealer_name: string | null;
  total: string;
}

/**
 * The farm's audit log, newest first. Each event names the dealer its actor acted for when the
 * actor is a linked dealer's advisor and not a member of the farm — so reads, reminders,
 * proposals and services a dealer recorded all show under that dealer.
 */
export async function farmAuditEvents(access: OrgAccess, query: AuditQuery) {
  const where = ['e.organization_id = :org'];
  if (query.dealerOrganizationId) where.push('d.id = :dealer');
  if (query.via === 'dealer') where.push('d.id IS NOT NULL');
  const rows = await sequelize.query<RawEvent>(
    `SELECT e.id, e.action, e.entity_type, e.entity_id, e.changes, e.created_at,
            u.id AS actor_id, u.name AS actor_name, d.id AS dealer_id, d.name AS dealer_name,
            count(*) OVER () AS total
     FROM audit_events e
     LEFT JOIN users u ON u.id = e.actor_user_id
     LEFT JOIN LATERAL (
       SELECT o.id, o.name FROM memberships m JOIN organizations o ON o.id = m.organization_id
       WHERE m.user_id = e.actor_user_id AND m.role = 'advisor' AND o.kind = 'dealer'
         AND NOT EXISTS (SELECT 1 FROM memberships fm
                         WHERE fm.user_id = e.actor_user_id AND fm.organization_id = e.organization_id)
         AND EXISTS (SELECT 1 FROM dealer_links l
                     WHERE l.dealer_organization_id = o.id AND l.farm_organization_id = e.organization_id)
       ORDER BY (o.id::text = e.changes->>'dealerOrganizationId') DESC, o.name
       LIMIT 1
     ) d ON true
     WHERE ${where.join(' AND ')}
     ORDER BY e.created_at DESC, e.id DESC
     LIMIT :limit OFFSET :offset`,
    {
      replacements: {
        org: access.organization.id,
        dealer: query.dealerOrganizationId ?? null,
        limit: query.pageSize,
        offset: (query.page - 1) * query.pageSize,
      },
      type: QueryTypes.SELECT,
    },
  );
  return {
    total: rows.length ? Number(rows[0].total) : 0,
    events: rows.map((r) => ({
      id: String(r.id),
      action: r.action,
      entityType: r.entity_type,
      entityId: r.entity_id,
      path: typeof r.changes?.path === 'string' ? r.changes.path : null,
      actor: r.actor_id ? { id: r.actor_id, name: r.actor_name ?? '' } : null,
      dealer: r.dealer_id ? { id: r.dealer_id, name: r.dealer_name ?? '' } : null,
      createdAt: new Date(r.created_at).toISOString(),
    })),
  };
}
