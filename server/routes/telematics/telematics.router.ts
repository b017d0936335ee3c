import express, { Router } from 'express';
import { route } from '../route';
import {
  CANDUMP_MAX_BYTES,
  candumpBodySchema,
  candumpResponseSchema,
  isoSnapshotSchema,
  snapshotResponseSchema,
  telematicsMachineParams,
} from '../../../shared/schemas/telematics';
import { ingestSnapshot } from '../../services/telematics';
import { ingestCandump } from '../../services/telematics-candump';

const KEY = { apiKey: 'readings:write' } as const;
const candumpText = express.text({ type: 'text/plain', limit: CANDUMP_MAX_BYTES });

/** Readings straight from the machine: only an organization API key reaches these routes. */
export function telematicsRouter(): Router {
  const router = Router();

  route(router, {
    method: 'post',
    path: '/telematics/iso15143-3',
    summary:
      'Post an ISO/TS 15143-3 fleet snapshot (API key): each Equipment entry matched to a machine by telematics id, serial number or PIN and its CumulativeOperatingHours recorded through the reading rules; an answer per entry',
    tags: ['telematics'],
    access: KEY,
    body: isoSnapshotSchema,
    response: snapshotResponseSchema,
    handler: async ({ req, body }) => ({ data: await ingestSnapshot(req.apiKey!, body) }),
  });

  route(router, {
    method: 'post',
    path: '/telematics/machines/:machine/j1939',
    summary:
      "Post a SAE J1939 candump log for one machine (API key; the machine's id or telematics id in the path): PGN 65253 engine hours, the last frame of each clock hour recorded",
    tags: ['telematics'],
    access: KEY,
    before: [candumpText],
    params: telematicsMachineParams,
    textBody: candumpBodySchema,
    response: candumpResponseSchema,
    handler: async ({ req, params, body }) => ({
      data: await ingestCandump(req.apiKey!, params.machine, body as string),
    }),
  });

  return router;
}
