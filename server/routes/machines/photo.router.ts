import { Router } from 'express';
import { z } from 'zod';
import { rawResponse, route } from '../route';
import { machinePhotoResponseSchema } from '../../../shared/schemas/machines';
import { authorize } from '../../policies/access';
import { canUpdateMachine } from '../../policies/machine';
import { loadMachine } from '../../services/machines';
import {
  openMachinePhoto,
  removeMachinePhoto,
  setMachinePhoto,
} from '../../services/machine-photos';
import { IMAGE_MAX_BYTES } from '../../infra/images';
import { fileUpload } from '../../middlewares/upload';

const params = z.object({ orgId: z.uuid(), machineId: z.uuid() });

/** Machine photos: stored in the object store, served only through the API to people who may see the machine. */
export function machinePhotoRouter(): Router {
  const router = Router();

  route(router, {
    method: 'put',
    path: '/organizations/:orgId/machines/:machineId/photo',
    summary:
      "Upload or replace a machine's photo (JPEG, PNG, WebP or HEIC, at most 10 MB; checked by content)",
    tags: ['machines'],
    params,
    before: [fileUpload('photo', IMAGE_MAX_BYTES, 'a photo')],
    multipartBody: z.object({ photo: z.string().openapi({ format: 'binary' }) }),
    response: machinePhotoResponseSchema,
    handler: async ({ req, params: p }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, p.machineId);
      authorize(canUpdateMachine(access), 'Only a manager may change the photo');
      await setMachinePhoto(access, machine, req.file!.buffer);
      const base = `/api/v1/organizations/${access.organization.id}/machines/${machine.id}/photo`;
      return { data: { photoUrl: base, thumbnailUrl: `${base}?size=thumb` } };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/photo',
    summary: "The machine's photo (size=thumb for the thumbnail)",
    tags: ['machines'],
    params,
    query: z.object({ size: z.enum(['full', 'thumb']).default('full') }),
    response: rawResponse('image/webp', 'the photo or its thumbnail'),
    handler: async ({ req, res, params: p, query }) => {
      const { machine } = await loadMachine(req.access!, p.machineId);
      const object = await openMachinePhoto(machine, query.size);
      res.setHeader('Content-Type', object.contentType);
      res.setHeader('Cache-Control', 'private, max-age=3600');
      if (object.length) res.setHeader('Content-Length', String(object.length));
      await new Promise<void>((resolve, reject) => {
        object.body.on('error', reject).pipe(res).on('finish', resolve).on('error', reject);
      });
    },
  });

  route(router, {
    method: 'delete',
    path: '/organizations/:orgId/machines/:machineId/photo',
    summary: "Remove the machine's photo",
    tags: ['machines'],
    params,
    status: 204,
    handler: async ({ req, params: p }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, p.machineId);
      authorize(canUpdateMachine(access), 'Only a manager may change the photo');
      await removeMachinePhoto(machine);
    },
  });

  return router;
}
