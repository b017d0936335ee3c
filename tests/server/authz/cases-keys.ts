// How the matrix calls the machine-data routes (issue 13): the farm's API keys (its manager's
// settings) and the two telematics posts. The matrix's callers carry session cookies, never a
// key, so every telematics cell is a 401 (a session is not a key); what a key itself may reach is
// tested in tests/server/api-keys.test.ts (every other route 401 with a key).
import { randomUUID } from 'node:crypto';
import { newApiKeySecret } from '../../../server/infra/api-key-secret';
import { ApiKey } from '../../../server/models/api-key';
import { onFarm, type Case, type Ctx } from './cases-fleet';

/** A live key of the farm whose ids the cell sends (own: the farm; foreign: the other farm). */
async function freshKey(c: Ctx): Promise<string> {
  const { prefix, secretHash } = newApiKeySecret();
  const key = await ApiKey.create({
    organizationId: c.rec.org.id,
    name: `Matrix feed ${randomUUID().slice(0, 8)}`,
    prefix,
    secretHash,
    scopes: ['readings:write'],
    createdBy: c.rec.manager.id,
  });
  return key.id;
}

const snapshot = (c: Ctx) => ({
  Fleet: {
    Equipment: [
      {
        EquipmentHeader: { SerialNumber: c.rec.machine.serialNumber || 'MATRIX-1' },
        CumulativeOperatingHours: { datetime: new Date().toISOString(), Hour: 5000 },
      },
    ],
  },
});

export const KEY_CASES: Record<string, Case> = {
  'GET /organizations/{orgId}/api-keys': { ids: 'none', build: (c) => ({ params: onFarm(c) }) },
  'POST /organizations/{orgId}/api-keys': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c), body: { name: 'Yard feed' } }),
  },
  'DELETE /organizations/{orgId}/api-keys/{keyId}': {
    ids: 'path',
    build: async (c) => ({ params: { ...onFarm(c), keyId: await freshKey(c) } }),
  },
  'POST /telematics/iso15143-3': { ids: 'none', build: (c) => ({ params: {}, body: snapshot(c) }) },
  'POST /telematics/machines/{machine}/j1939': {
    ids: 'path',
    build: (c) => ({ params: { machine: c.rec.machine.id }, body: {} }),
  },
};
