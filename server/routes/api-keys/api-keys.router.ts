import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  apiKeyCreateSchema,
  apiKeyCreatedResponseSchema,
  apiKeyListResponseSchema,
} from '../../../shared/schemas/api-keys';
import { authorize } from '../../policies/access';
import { canManageApiKeys } from '../../policies/api-key';
import { presentApiKey } from '../../presenters/api-key';
import { createApiKey, listApiKeys, revokeApiKey } from '../../services/api-keys';

const orgParams = z.object({ orgId: z.uuid() });
const MANAGERS_ONLY = 'Only the farm manager may manage API keys';

/** The organization's machine-data keys: made, listed and revoked by its manager. */
export function apiKeysRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/api-keys',
    summary: "The organization's API keys for machine data (prefix, name, scope, last use)",
    tags: ['api-keys'],
    params: orgParams,
    response: apiKeyListResponseSchema,
    handler: async ({ req }) => {
      authorize(canManageApiKeys(req.access!), MANAGERS_ONLY);
      const keys = await listApiKeys(req.access!);
      return { data: keys.map((k) => presentApiKey(k.key, k.createdByName)) };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/api-keys',
    summary:
      'Make an API key for machine data (readings:write); the answer carries the key itself, once',
    tags: ['api-keys'],
    params: orgParams,
    body: apiKeyCreateSchema,
    status: 201,
    response: apiKeyCreatedResponseSchema,
    handler: async ({ req, body }) => {
      authorize(canManageApiKeys(req.access!), MANAGERS_ONLY);
      const { key, secret, createdByName } = await createApiKey(req.access!, body);
      return { data: { ...presentApiKey(key, createdByName), secret } };
    },
  });

  route(router, {
    method: 'delete',
    path: '/organizations/:orgId/api-keys/:keyId',
    summary: 'Revoke an API key: refused from its next request on; the key stays listed as revoked',
    tags: ['api-keys'],
    params: orgParams.extend({ keyId: z.uuid() }),
    status: 204,
    handler: async ({ req, params }) => {
      authorize(canManageApiKeys(req.access!), MANAGERS_ONLY);
      await revokeApiKey(req.access!, params.keyId);
    },
  });

  return router;
}
