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
import {
  canCorrectReading,
  canImportReadings,
  canLogReading,
  canReplaceMeter,
} from '../../policies/machine';
import { presentLastReading } from '../../presenters/machine';
import { presentReading, presentReplacement } from '../../presenters/reading';
import { listMachines, loadMachine, loadVisibleMachines } from '../../services/machines';
import {
  correctReading,
  deleteReading,
  replaceMeter,
  writeReadings,
  type NewReading,
} from '../../services/readings';
import { commitImport, previewImport } from '../../services/reading-import';
import { MeterReading, MeterReplacement } from '../../models';
import { sequelize } from '../../db';
import { invalid, notFound } from '../../errors';
import { csvUpload } from '../../middlewares/upload';

const orgParams = z.object({ orgId: z.uuid() });
const machineParams = orgParams.extend({ machineId: z.uuid() });
const readingParams = orgParams.extend({ readingId: z.uuid() });

const csvBody = z.object({
  file: z.string().openapi({ format: 'binary', description: 'CSV: fleet number, taken at, value' }),
});

async function loadReading(orgId: string, readingId: string) {
  const reading = await MeterReading.findOne({ where: { id: readingId, organizationId: orgId } });
  if (!reading) throw notFound('Reading');
  return reading;
}

export function readingsRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/readings',
    summary: "A machine's readings (newest first) and meter replacements",
    tags: ['readings'],
    params: machineParams,
    query: z.object({ limit: z.coerce.number().int().min(1).max(5000).default(200) }),
    response: readingHistoryResponseSchema,
    handler: async ({ req, params, query }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      const [readings, replacements] = await Promise.all([
        MeterReading.findAll({
          where: { organizationId: access.organization.id, machineId: machine.id },
          order: [
            ['takenAt', 'DESC'],
            ['lifetimeValue', 'DESC'],
          ],
          limit: query.limit,
        }),
        MeterReplacement.findAll({
          where: { organizationId: access.organization.id, machineId: machine.id },
          order: [['replacedAt', 'DESC']],
        }),
      ]);
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
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(
        canLogReading(access, machine),
        machine.status === 'sold' ? 'This machine is sold; readings are closed' : undefined,
      );
      const [outcome] = await sequelize.transaction((transaction) =>
        writeReadings(
          access,
          [
            {
              machine,
              value: body.value,
              takenAt: body.takenAt ? new Date(body.takenAt) : new Date(),
              source: 'manual',
            },
          ],
          transaction,
        ),
      );
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
      const { items } = await listMachines(access, {
        sort: 'fleetNumber',
        order: 'asc',
        page: 1,
        pageSize: 10_000,
      });
      return {
        data: items
          .filter((i) => i.machine.status !== 'sold')
          .map((i) => ({
            machine: {
              id: i.machine.id,
              fleetNumber: i.machine.fleetNumber,
              name: i.machine.name,
              meterUnit: i.machine.meterUnit,
              status: i.machine.status,
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
      const items: NewReading[] = [];
      const missing: Record<string, string> = {};
      const machines = await loadVisibleMachines(
        access,
        body.readings.map((r) => r.machineId),
      );
      for (const [i, r] of body.readings.entries()) {
        const machine = machines.get(r.machineId);
        if (!machine) {
          missing[`readings.${i}.machineId`] = 'No such machine in this farm';
          continue;
        }
        if (!canLogReading(access, machine))
          missing[`readings.${i}.machineId`] =
            `${machine.fleetNumber} is sold; readings are closed`;
        items.push({
          machine,
          value: r.value,
          takenAt: r.takenAt ? new Date(r.takenAt) : new Date(),
          source: 'manual' as const,
        });
      }
      if (Object.keys(missing).length) throw invalid(missing);
      const outcomes = await sequelize.transaction((transaction) =>
        writeReadings(access, items, transaction, { fieldPrefix: (i) => `readings.${i}.` }),
      );
      return {
        data: outcomes.map((o) => ({ machineId: items[o.index].machine.id, status: o.status })),
      };
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
      const reading = await loadReading(access.organization.id, params.readingId);
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
      const reading = await loadReading(access.organization.id, params.readingId);
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
    before: [csvUpload()],
    multipartBody: csvBody,
    response: readingImportPreviewResponseSchema,
    handler: async ({ req }) => {
      const access = req.access!;
      authorize(canImportReadings(access), 'Only a manager or technician may import readings');
      return { data: await previewImport(access, req.file!.buffer) };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/readings/import/commit',
    summary:
      'Import a CSV of readings: one transaction, all or nothing; rows already imported are skipped',
    tags: ['readings'],
    params: orgParams,
    before: [csvUpload()],
    multipartBody: csvBody,
    status: 201,
    response: readingImportResultResponseSchema,
    handler: async ({ req }) => {
      const access = req.access!;
      authorize(canImportReadings(access), 'Only a manager or technician may import readings');
      return { data: await commitImport(access, req.file!.buffer) };
    },
  });

  return router;
}
