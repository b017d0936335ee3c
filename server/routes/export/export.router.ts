import { Router } from 'express';
import { z } from 'zod';
import { rawResponse, route } from '../route';
import { authorize } from '../../policies/access';
import { canExportFarmData } from '../../policies/farm-export';
import { startFarmExport } from '../../services/farm-export';

const params = z.object({ orgId: z.uuid() });

/** A file name a person recognises: hourstone-<farm>-<local date>.zip */
const fileName = (name: string, date: string) => {
  const slug = name
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');
  return `hourstone-${slug || 'farm'}-${date}.zip`;
};

export function exportRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/export',
    summary:
      "All of the farm's data as one zip of CSV files (machines, readings, tasks, service records with parts and measurements, walkarounds, defects), organization.json, the stored files and a README.txt of the columns. Managers only.",
    tags: ['organizations'],
    params,
    response: rawResponse('application/zip', 'the farm’s data (an attachment)'),
    handler: async ({ req, res }) => {
      const access = req.access!;
      authorize(canExportFarmData(access), "Only the farm's manager may download its data");
      const download = await startFarmExport(access, new Date());
      res.setHeader('Content-Type', 'application/zip');
      res.setHeader(
        'Content-Disposition',
        `attachment; filename="${fileName(access.organization.name, download.localDate)}"`,
      );
      res.setHeader('Cache-Control', 'no-store');
      res.status(200);
      await download.write(res);
    },
  });

  return router;
}
