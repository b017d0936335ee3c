import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  bulkReadingsResponseSchema,
  bulkReadingsSchema,
  latestReadingsResponseSchema,
  meterReplacementResponseSchema,
  meterReplacementSchema,
  readingCreateSchema,
  readingHistoryResponseSchema,
  readingImportPreviewResponseSchema,
  readingImportResultResponseSchema,
  readingLoggedResponseSchema,
  readingResponseSchema,
  readingUpdateSchema,
} from '../../../shared/schemas/readings';
import { authorize } from '../../policies/access';
import { canCorrectReading, canImportReadings, canReplaceMeter } from '../../policies/machine';
import { presentLastReading } from '../../presenters/machine';
import { presentReading, presentReplacement } from '../../presenters/reading';
import { loadMachine } from '../../services/machines';
import { correctReading, deleteReading, loadReading } from '../../services/reading-corrections';
import { replaceMeter } from '../../services/meter-changes';
import {
  logBulkReadings,
  logReading,
  machinesTakingReadings,
  readingHistory,
} from '../../services/reading-log';
import { commitImport, previewImport } from '../../services/reading-import';

const orgParams = z.object({ orgId: z.uuid() });
const machineParams = orgParams.extend({ machineId: z.uuid() });
const readingParams = orgParams.extend({ readingId: z.uuid() });

const csvBody = z.object({
  file: z.string().openapi({
    format: 'binary',
    description:
      'CSV: fleet number, taken at, value; at most 500,000 rows and 50 MB, read as it arrives',
  }),
});

export function readingsRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/readings',
    summary:
      "A meter's readings (newest first; the machine's primary meter unless meterId names another) and its replacements and resets",
    tags: ['readings'],
    params: machineParams,
    query: z.object({
      limit: z.coerce.number().int().min(1).max(5000).default(200),
      meterId: z.uuid().optional(),
    }),
    response: readingHistoryResponseSchema,
    handler: async ({ req, params, query }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      const { readings, replacements } = await readingHistory(
        access,
        machine,
        query.limit,
        query.meterId,
      );
      return {
        data: readings.map(presentReading),
        replacements: replacements.map(presentReplacement),
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/readings',
    summary:
      'Log an hour-meter reading (checked against its neighbours; an identical repeat is ignored)',
    tags: ['readings'],
    params: machineParams,
    body: readingCreateSchema,
    status: 201,
    response: readingLoggedResponseSchema,
    handler: async ({ req, params, body }) => {
      // loads, checks and locks the machine inside the write (one statement for the three)
      const outcome = await logReading(req.access!, params.machineId, body);
      return {
        data: outcome.reading ? presentReading(outcome.reading) : null,
        status: outcome.status,
      };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/readings/latest',
    summary:
      'Every machine the caller may log hours for, with its last reading (the log-hours screen)',
    tags: ['readings'],
    params: orgParams,
    response: latestReadingsResponseSchema,
    handler: async ({ req }) => {
      const access = req.access!;
      const items = await machinesTakingReadings(access);
      return {
        data: items.map((i) => ({
          machine: {
            id: i.machine.id,
            fleetNumber: i.machine.fleetNumber,
            name: i.machine.name,
            meterUnit: i.machine.meterUnit,
            status: i.machine.status,
            restricted: i.machine.restrictionReason != null,
            category: i.machine.category,
          },
          lastReading: presentLastReading(i.forecast),
        })),
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/readings/bulk',
    summary: 'Log readings for many machines at once: all or nothing',
    tags: ['readings'],
    params: orgParams,
    body: bulkReadingsSchema,
    status: 201,
    response: bulkReadingsResponseSchema,
    handler: async ({ req, body }) => {
      const access = req.access!;
      return { data: await logBulkReadings(access, body.readings) };
    },
  });

  route(router, {
    method: 'patch',
    path: '/organizations/:orgId/readings/:readingId',
    summary: 'Correct a reading (manager, technician); recorded in the audit log',
    tags: ['readings'],
    params: readingParams,
    body: readingUpdateSchema,
    response: readingResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const reading = await loadReading(access, params.readingId);
      const { machine } = await loadMachine(access, reading.machineId);
      authorize(canCorrectReading(access), 'Only a manager or technician may correct readings');
      await correctReading(access, machine, reading, {
        value: body.value,
        takenAt: body.takenAt ? new Date(body.takenAt) : undefined,
      });
      return { data: presentReading(reading) };
    },
  });

  route(router, {
    method: 'delete',
    path: '/organizations/:orgId/readings/:readingId',
    summary: 'Delete a reading (manager, technician); recorded in the audit log',
    tags: ['readings'],
    params: readingParams,
    status: 204,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const reading = await loadReading(access, params.readingId);
      const { machine } = await loadMachine(access, reading.machineId);
      authorize(canCorrectReading(access), 'Only a manager or technician may delete readings');
      await deleteReading(access, machine, reading);
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/meter-replacements',
    summary:
      "Record a meter replacement (old meter's final value, new meter's start); lifetime values stay continuous",
    tags: ['readings'],
    params: machineParams,
    body: meterReplacementSchema,
    status: 201,
    response: meterReplacementResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(
        canReplaceMeter(access),
        'Only a manager or technician may record a meter replacement',
      );
      const r = await replaceMeter(access, machine, {
        ...body,
        replacedAt: new Date(body.replacedAt),
      });
      return { data: presentReplacement(r) };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/readings/import/preview',
    summary:
      'Check a CSV of readings: every row with its machine and any error by line number; writes nothing',
    tags: ['readings'],
    params: orgParams,
    multipartBody: csvBody,
    response: readingImportPreviewResponseSchema,
    handler: async ({ req }) => {
      const access = req.access!;
      authorize(canImportReadings(access), 'Only a manager or technician may import readings');
      return { data: await previewImport(access, req) };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/readings/import/commit',
    summary:
      'Import a CSV of readings: one transaction, all or nothing; rows already imported are skipped',
    tags: ['readings'],
    params: orgParams,
    multipartBody: csvBody,
    status: 201,
    response: readingImportResultResponseSchema,
    handler: async ({ req }) => {
      const access = req.access!;
      authorize(canImportReadings(access), 'Only a manager or technician may import readings');
      return { data: await commitImport(access, req) };
    },
  });

  return router;
}
