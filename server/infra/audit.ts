import type { Transaction } from 'sequelize';
import { AuditEvent } from '../models';

/** Records who changed what. Called inside the transaction of the change itself. */
export async function recordAudit(
  event: {
    organizationId: string | null;
    actorUserId: string | null;
    action: string;
    entityType: string;
    entityId?: string | null;
    changes?: Record<string, unknown>;
  },
  transaction?: Transaction,
): Promise<void> {
  await AuditEvent.create(
    { ...event, entityId: event.entityId ?? null, changes: event.changes ?? {} },
    { transaction },
  );
}
