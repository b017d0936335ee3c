import { z } from 'zod';
import { plainText } from './common';

/** What a key may do; only writing machine readings for now (migration 0027 allows no other). */
export const API_KEY_SCOPES = ['readings:write'] as const;
export type ApiKeyScope = (typeof API_KEY_SCOPES)[number];

export const apiKeyCreateSchema = z.object({
  name: plainText(80, { required: 'Name the key, e.g. after the feed that uses it' }),
  scopes: z
    .array(z.enum(API_KEY_SCOPES, { error: `Scope must be one of: ${API_KEY_SCOPES.join(', ')}` }))
    .min(1, { error: 'Give the key at least one scope' })
    .max(API_KEY_SCOPES.length, { error: 'Name each scope once' })
    .refine((s) => new Set(s).size === s.length, { error: 'Name each scope once' })
    .default(['readings:write']),
});
export type ApiKeyCreateInput = z.infer<typeof apiKeyCreateSchema>;

// ── Responses ────────────────────────────────────────────────────────────────────────────────

/** A key as people see it: never the secret, which is shown once when the key is made. */
export const apiKeySchema = z
  .object({
    id: z.string(),
    name: z.string(),
    /** the first part of the key (`hs_<prefix>_…`), to tell keys apart */
    prefix: z.string(),
    scopes: z.array(z.enum(API_KEY_SCOPES)),
    createdAt: z.string(),
    /** the name of whoever made it; null once that account is gone */
    createdBy: z.string().nullable(),
    lastUsedAt: z.string().nullable(),
    revokedAt: z.string().nullable(),
  })
  .meta({ id: 'ApiKey' });
export type ApiKey = z.infer<typeof apiKeySchema>;

export const apiKeyListResponseSchema = z.object({ data: z.array(apiKeySchema) });

/** The new key with its secret: the only answer that ever carries it. */
export const apiKeyCreatedResponseSchema = z.object({
  data: apiKeySchema.extend({
    /** the whole key, `hs_<prefix>_<secret>`: shown once, stored only as a hash */
    secret: z.string(),
  }),
});
export type ApiKeyCreated = z.infer<typeof apiKeyCreatedResponseSchema>['data'];

export const apiKeyResponseSchema = z.object({ data: apiKeySchema });
