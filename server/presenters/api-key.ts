import type { ApiKey as ApiKeyJson } from '../../shared/schemas/api-keys';
import type { ApiKey } from '../models/api-key';

/** A key as listed: never its secret nor the secret's hash. */
export const presentApiKey = (key: ApiKey, createdByName: string | null): ApiKeyJson => ({
  id: key.id,
  name: key.name,
  prefix: key.prefix,
  scopes: key.scopes,
  createdAt: key.createdAt.toISOString(),
  createdBy: createdByName,
  lastUsedAt: key.lastUsedAt?.toISOString() ?? null,
  revokedAt: key.revokedAt?.toISOString() ?? null,
});
