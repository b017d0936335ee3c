import { Router, type Request } from 'express';
import { z } from 'zod';
import { rawResponse, route } from '../route';
import {
  fleetImportPreviewResponseSchema,
  fleetImportResultResponseSchema,
} from '../../../shared/schemas/fleet-import';
import { authorize } from '../../policies/access';
import { canCreateMachine } from '../../policies/machine';
import { csvUpload } from '../../middlewares/upload';
import { commitFleetImport, previewFleetImport } from '../../services/fleet-import';
import { fleetExampleCsv } from '../../services/fleet-import-example';

const orgParams = z.object({ orgId: z.uuid() });
const csvBody = z.object({
  file: z.string().openapi({
    format: 'binary',
    description:
      'CSV: fleet number, name, category, make, model, serial, year, meter unit, meter reading, reading date, schedule, and "<task> last done" / "<task> last meter" columns',
  }),
});
const NOT_ALLOWED = 'Only a manager may import the fleet';

const manager = (req: Request) => {
  const access = req.access!;
  authorize(canCreateMachine(access), NOT_ALLOWED);
  return access;
};

/** Fleet import from a spreadsheet (manager): preview, all-or-nothing commit, example file. */
export function fleetImportRouter(): Router {
  const router = Router();

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/fleet-import/preview',
    summary:
      "Check a fleet file: every row's outcome (create, update, unchanged, error) and errors by line; writes nothing",
    tags: ['machines'],
    params: orgParams,
    before: [csvUpload()],
    multipartBody: csvBody,
    response: fleetImportPreviewResponseSchema,
    handler: async ({ req }) => ({
      data: await previewFleetImport(manager(req), req.file!.buffer),
    }),
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/fleet-import/commit',
    summary:
      'Import a fleet file in one transaction, all or nothing; existing fleet numbers change only the cells given',
    tags: ['machines'],
    params: orgParams,
    before: [csvUpload()],
    multipartBody: csvBody,
    status: 201,
    response: fleetImportResultResponseSchema,
    handler: async ({ req }) => ({ data: await commitFleetImport(manager(req), req.file!.buffer) }),
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/fleet-import/example',
    summary: "An example fleet file (invented machines) in this farm's date and number format",
    tags: ['machines'],
    params: orgParams,
    response: rawResponse('text/csv', 'an example fleet file (an attachment)'),
    handler: async ({ req, res }) => {
      const access = manager(req);
      res.setHeader('Content-Type', 'text/csv; charset=utf-8');
      res.setHeader('Content-Disposition', 'attachment; filename="hourstone-fleet-example.csv"');
      res.setHeader('Cache-Control', 'private, no-store');
      res.status(200).send(await fleetExampleCsv(access));
    },
  });

  return router;
}
