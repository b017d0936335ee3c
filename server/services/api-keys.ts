// Organization API keys for machine data: made (the secret shown once), listed and revoked by a
// manager, each change in the audit log; and the lookup of a key on each machine-data request.
import { QueryTypes } from 'sequelize';
import { sequelize } from '../db';
import { notFound } from '../errors';
import { recordAudit } from '../infra/audit';
import { newApiKeySecret, readApiKey } from '../infra/api-key-secret';
import { instanceFrom } from '../infra/session-load';
import { Organization, User } from '../models';
// imported from its own file: models/index.ts is being reworked beside this change
import { ApiKey } from '../models/api-key';
import type { KeyContext, OrgAccess } from '../policies/context';
import type { ApiKeyCreateInput } from '../../shared/schemas/api-keys';

/** A key with the name of whoever made it (null once that account is gone). */
export interface ListedKey {
  key: ApiKey;
  createdByName: string | null;
}

/** The organization's keys, newest first, revoked ones included (their readings name them). */
export async function listApiKeys(access: OrgAccess): Promise<ListedKey[]> {
  const keys = await ApiKey.findAll({
    where: { organizationId: access.organization.id },
    order: [
      ['createdAt', 'DESC'],
      ['id', 'ASC'],
    ],
  });
  const creators = await namesOf(keys.map((k) => k.createdBy));
  return keys.map((key) => ({ key, createdByName: creators.get(key.createdBy ?? '') ?? null }));
}

async function namesOf(ids: (string | null)[]) {
  const wanted = [...new Set(ids.filter((id): id is string => id !== null))];
  if (!wanted.length) return new Map<string, string>();
  const users = await User.findAll({ where: { id: wanted }, attributes: ['id', 'name'] });
  return new Map(users.map((u) => [u.id, u.name]));
}

/** A new key; its whole text is in the answer and nowhere else. */
export async function createApiKey(access: OrgAccess, input: ApiKeyCreateInput) {
  return sequelize.transaction(async (transaction) => {
    const { text, prefix, secretHash } = newApiKeySecret();
    const key = await ApiKey.create(
      {
        organizationId: access.organization.id,
        name: input.name,
        prefix,
        secretHash,
        scopes: input.scopes,
        createdBy: access.userId,
      },
      { transaction },
    );
    await recordAudit(
      {
        organizationId: access.organization.id,
        actorUserId: access.userId,
        action: 'api_key.create',
        entityType: 'api_key',
        entityId: key.id,
        changes: { name: key.name, prefix: key.prefix, scopes: key.scopes },
      },
      transaction,
    );
    const [creator] = [...(await namesOf([access.userId])).values()];
    return { key, secret: text, createdByName: creator ?? null };
  });
}

/** Revokes a key of the caller's organization at once (the next request with it is refused). */
export async function revokeApiKey(access: OrgAccess, keyId: string): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    const key = await ApiKey.findOne({
      where: { id: keyId, organizationId: access.organization.id },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!key) throw notFound('API key');
    if (key.revokedAt) return;
    await key.update({ revokedAt: new Date() }, { transaction });
    await recordAudit(
      {
        organizationId: access.organization.id,
        actorUserId: access.userId,
        action: 'api_key.revoke',
        entityType: 'api_key',
        entityId: key.id,
        changes: { name: key.name, prefix: key.prefix },
      },
      transaction,
    );
  });
}

// One statement per request: the live key (not revoked, secret matching) is marked used and comes
// back with its organization. Nothing is cached, so a revocation counts from the next request.
// Hashes are compared, not secrets: timing tells nothing that helps find a secret of 256 bits.
const KEY_SQL = `UPDATE api_keys k SET last_used_at = now()
  FROM organizations o
  WHERE k.prefix = $1 AND k.secret_hash = $2 AND k.revoked_at IS NULL
    AND o.id = k.organization_id
  RETURNING k.id, k.prefix, k.name, k.scopes, k.created_by, to_jsonb(o) AS organization`;

/** The key a request's `Authorization: Bearer` names, or null when it is unknown or revoked. */
export async function authenticateApiKey(text: string): Promise<KeyContext | null> {
  const parsed = readApiKey(text);
  if (!parsed) return null;
  const [row] = await sequelize.query<{
    id: string;
    prefix: string;
    name: string;
    scopes: string[];
    created_by: string | null;
    organization: Record<string, unknown>;
  }>(KEY_SQL, { bind: [parsed.prefix, parsed.secretHash], type: QueryTypes.SELECT });
  if (!row) return null;
  return {
    organization: instanceFrom(Organization, row.organization),
    keyId: row.id,
    keyPrefix: row.prefix,
    keyName: row.name,
    scopes: row.scopes,
    createdBy: row.created_by,
  };
}
