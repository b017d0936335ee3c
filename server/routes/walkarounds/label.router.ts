import type { Router } from 'express';
import { z } from 'zod';
import QRCode from 'qrcode';
import { route } from '../route';
import { env } from '../../env';
import { loadMachine } from '../../services/machines';
import type { Machine } from '../../models';

const params = z.object({ orgId: z.uuid(), machineId: z.uuid() });

const xml = (s: string) =>
  s.replace(
    /[<>&"']/g,
    (c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', '"': '&quot;', "'": '&apos;' })[c]!,
  );

/** The page a phone opens from the machine's label: its walkaround. */
export const walkaroundUrl = (orgId: string, machineId: string) =>
  `${env.APP_URL.replace(/\/+$/, '')}/o/${orgId}/walkaround/${machineId}`;

/** A printable label: the QR code of the machine's walkaround, its fleet number and name. */
export async function labelSvg(machine: Machine): Promise<string> {
  const url = walkaroundUrl(machine.organizationId, machine.id);
  const qr = await QRCode.toString(url, { type: 'svg', errorCorrectionLevel: 'M', margin: 0 });
  const nested = qr.trim().replace('<svg ', '<svg x="30" y="30" width="240" height="240" ');
  const name = machine.name.length > 34 ? `${machine.name.slice(0, 33)}…` : machine.name;
  return [
    '<svg xmlns="http://www.w3.org/2000/svg" width="60mm" height="76mm" viewBox="0 0 300 380"',
    ` role="img" aria-label="${xml(`Walkaround QR code for ${machine.fleetNumber} ${machine.name}`)}">`,
    '<rect x="0.5" y="0.5" width="299" height="379" rx="12" fill="#ffffff" stroke="#000000"/>',
    nested,
    '<g font-family="Lato, Arial, sans-serif" text-anchor="middle" fill="#000000">',
    `<text x="150" y="308" font-size="30" font-weight="700">${xml(machine.fleetNumber)}</text>`,
    `<text x="150" y="334" font-size="15">${xml(name)}</text>`,
    '<text x="150" y="360" font-size="12">Scan for the daily walkaround</text>',
    '</g></svg>',
  ].join('');
}

export function registerLabelRoutes(router: Router): void {
  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/label.svg',
    summary:
      "The machine's printable label (SVG): a QR code opening its walkaround (APP_URL/o/:orgId/walkaround/:machineId), fleet number and name",
    tags: ['walkarounds'],
    params,
    query: z.object({ download: z.enum(['0', '1']).default('0') }),
    response: z.string().openapi({ description: 'image/svg+xml' }),
    handler: async ({ req, res, params: p, query }) => {
      const { machine } = await loadMachine(req.access!, p.machineId);
      res.setHeader('Content-Type', 'image/svg+xml; charset=utf-8');
      res.setHeader('Cache-Control', 'private, max-age=300');
      if (query.download === '1')
        res.setHeader(
          'Content-Disposition',
          `attachment; filename="${machine.fleetNumber.replace(/[^\w.-]/g, '_')}-label.svg"`,
        );
      res.status(200).send(await labelSvg(machine));
    },
  });
}
