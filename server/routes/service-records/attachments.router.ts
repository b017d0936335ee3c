import { randomUUID } from 'node:crypto';
import type { Response, Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { authorize } from '../../policies/access';
import { isShop } from '../../policies/service-record';
import { loadRecord } from '../../services/service-records';
import { deleteObject, getObject, putObject } from '../../infra/storage';
import { prepareAttachment } from '../../infra/images';
import { fileUpload } from '../../middlewares/upload';
import { AppError, invalid, notFound } from '../../errors';
import { recordAudit } from '../../infra/audit';
import { ServiceAttachment } from '../../models';
import { presentRecord } from '../../presenters/service-record';
import { attachmentResponseSchema } from '../../../shared/schemas/service-record-responses';
import { ATTACHMENT_MAX_BYTES, ATTACHMENTS_PER_RECORD } from '../../../shared/schemas/service-records';
import type { Readable } from 'node:stream';

const recordParams = z.object({ orgId: z.uuid(), recordId: z.uuid() });
const attachmentParams = recordParams.extend({ attachmentId: z.uuid() });

/** A file name safe to store and to send back in a header. */
const cleanName = (name: string) =>
  [...name]
    .map((c) => (c.charCodeAt(0) < 32 || '\\/"'.includes(c) ? '_' : c))
    .join('')
    .trim()
    .slice(0, 200) || 'attachment';

const keyOf = (a: ServiceAttachment, thumb: boolean) =>
  a.kind === 'pdf' ? `${a.objectKey}.pdf` : `${a.objectKey}${thumb ? '-thumb' : ''}.webp`;

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
      if (record.status === 'cancelled')
        throw new AppError(409, 'cancelled', 'This record is cancelled; it takes no attachments');
      const count = await ServiceAttachment.count({
        where: { organizationId: access.organization.id, serviceRecordId: record.id },
      });
      if (count >= ATTACHMENTS_PER_RECORD)
        throw invalid({ file: `A record holds at most ${ATTACHMENTS_PER_RECORD} attachments` });
      const prepared = await prepareAttachment(req.file!.buffer, 'file');
      const objectKey = `org/${access.organization.id}/service-records/${record.id}/${randomUUID()}`;
      const stored: string[] = [];
      if (prepared.kind === 'pdf') {
        await putObject(`${objectKey}.pdf`, prepared.body, prepared.contentType);
        stored.push(`${objectKey}.pdf`);
      } else {
        await putObject(`${objectKey}.webp`, prepared.full, prepared.contentType);
        await putObject(`${objectKey}-thumb.webp`, prepared.thumb, prepared.contentType);
        stored.push(`${objectKey}.webp`, `${objectKey}-thumb.webp`);
      }
      const original = cleanName(req.file!.originalname);
      try {
        const attachment = await ServiceAttachment.create({
          organizationId: access.organization.id,
          machineId: record.machineId,
          serviceRecordId: record.id,
          kind: prepared.kind,
          contentType: prepared.contentType,
          fileName:
            prepared.kind === 'image' ? original.replace(/\.[^.]*$/, '') + '.webp' : original,
          sizeBytes: prepared.kind === 'pdf' ? prepared.body.length : prepared.full.length,
          objectKey,
          uploadedBy: access.userId,
        });
        await recordAudit({
          organizationId: access.organization.id,
          actorUserId: access.userId,
          action: 'service.attach',
          entityType: 'service_record',
          entityId: record.id,
          changes: {
            attachmentId: attachment.id,
            kind: attachment.kind,
            fileName: attachment.fileName,
          },
        });
        const presented = await presentRecord(record, {
          withDefects: false,
          currency: access.organization.currency,
        });
        return { data: presented.attachments.find((a) => a.id === attachment.id)! };
      } catch (err) {
        await Promise.allSettled(stored.map(deleteObject));
        throw err;
      }
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
      const a = await ServiceAttachment.findOne({
        where: {
          id: params.attachmentId,
          organizationId: access.organization.id,
          serviceRecordId: record.id,
        },
      });
      if (!a) throw notFound('Attachment');
      if (query.size === 'thumb' && a.kind === 'pdf') throw notFound('Thumbnail');
      await sendObject(res, await getObject(keyOf(a, query.size === 'thumb')), a.fileName);
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
      const a = await ServiceAttachment.findOne({
        where: {
          id: params.attachmentId,
          organizationId: access.organization.id,
          serviceRecordId: record.id,
        },
      });
      if (!a) throw notFound('Attachment');
      await a.destroy();
      await recordAudit({
        organizationId: access.organization.id,
        actorUserId: access.userId,
        action: 'service.detach',
        entityType: 'service_record',
        entityId: record.id,
        changes: { attachmentId: a.id, fileName: a.fileName },
      });
      await Promise.allSettled([
        deleteObject(keyOf(a, false)),
        ...(a.kind === 'image' ? [deleteObject(keyOf(a, true))] : []),
      ]);
    },
  });
}
