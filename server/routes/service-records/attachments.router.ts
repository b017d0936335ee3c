import type { Response, Router } from 'express';
import type { Readable } from 'node:stream';
import { z } from 'zod';
import { route } from '../route';
import { authorize } from '../../policies/access';
import { isShop } from '../../policies/service-record';
import { loadRecord } from '../../services/service-records';
import {
  attachmentFile,
  attachToRecord,
  removeAttachment,
} from '../../services/service-attachments';
import { fileUpload } from '../../middlewares/upload';
import { presentRecord } from '../../presenters/service-record';
import { attachmentResponseSchema } from '../../../shared/schemas/service-record-responses';
import { ATTACHMENT_MAX_BYTES } from '../../../shared/schemas/service-records';

const recordParams = z.object({ orgId: z.uuid(), recordId: z.uuid() });
const attachmentParams = recordParams.extend({ attachmentId: z.uuid() });

/** Streams an object to the response with its type; files are only ever served through the API. */
export async function sendObject(
  res: Response,
  object: { body: Readable; contentType: string; length?: number },
  fileName?: string,
) {
  res.setHeader('Content-Type', object.contentType);
  res.setHeader('Cache-Control', 'private, max-age=3600');
  if (object.length) res.setHeader('Content-Length', String(object.length));
  if (fileName) {
    const ascii = fileName.replace(/[^\x20-\x7e]/g, '_');
    res.setHeader(
      'Content-Disposition',
      `inline; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(fileName)}`,
    );
  }
  await new Promise<void>((resolve, reject) => {
    object.body.on('error', reject).pipe(res).on('finish', resolve).on('error', reject);
  });
}

/** Photos and PDFs on a service record: type checked by content, at most 10 MB, images with thumbnails. */
export function registerAttachmentRoutes(router: Router): void {
  route(router, {
    method: 'post',
    path: '/organizations/:orgId/service-records/:recordId/attachments',
    summary:
      'Attach a photo (JPEG, PNG, WebP, HEIC; stored as WebP with a thumbnail) or a PDF to a record; at most 10 MB, type checked by content',
    tags: ['services'],
    params: recordParams,
    before: [fileUpload('file', ATTACHMENT_MAX_BYTES, 'a photo or PDF')],
    multipartBody: z.object({ file: z.string().openapi({ format: 'binary' }) }),
    status: 201,
    response: attachmentResponseSchema,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const { record } = await loadRecord(access, params.recordId);
      authorize(isShop(access), 'Only a technician or manager attaches files to a record');
      const attachment = await attachToRecord(access, record, req.file!);
      const presented = await presentRecord(record, {
        withDefects: false,
        currency: access.organization.currency,
      });
      return { data: presented.attachments.find((a) => a.id === attachment.id)! };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/service-records/:recordId/attachments/:attachmentId',
    summary:
      'An attachment (size=thumb for an image thumbnail), only to people who may see the machine',
    tags: ['services'],
    params: attachmentParams,
    query: z.object({ size: z.enum(['full', 'thumb']).default('full') }),
    response: z.string().openapi({ format: 'binary' }),
    handler: async ({ req, res, params, query }) => {
      const access = req.access!;
      const { record } = await loadRecord(access, params.recordId);
      const { object, fileName } = await attachmentFile(
        access,
        record,
        params.attachmentId,
        query.size === 'thumb',
      );
      await sendObject(res, object, fileName);
    },
  });

  route(router, {
    method: 'delete',
    path: '/organizations/:orgId/service-records/:recordId/attachments/:attachmentId',
    summary: 'Remove an attachment',
    tags: ['services'],
    params: attachmentParams,
    status: 204,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const { record } = await loadRecord(access, params.recordId);
      authorize(isShop(access), 'Only a technician or manager removes attachments');
      await removeAttachment(access, record, params.attachmentId);
    },
  });
}
