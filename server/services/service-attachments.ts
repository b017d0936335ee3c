import { randomUUID } from 'node:crypto';
import { AppError, invalid, notFound } from '../errors';
import { ServiceAttachment, type ServiceRecord } from '../models';
import type { OrgAccess } from '../policies/access';
import { deleteObject, getObject, putObject } from '../infra/storage';
import { prepareAttachment } from '../infra/images';
import { recordAudit } from '../infra/audit';
import { ATTACHMENTS_PER_RECORD } from '../../shared/schemas/service-records';

/** A file name safe to store and to send back in a header. */
const cleanName = (name: string) =>
  [...name]
    .map((c) => (c.charCodeAt(0) < 32 || '\\/"'.includes(c) ? '_' : c))
    .join('')
    .trim()
    .slice(0, 200) || 'attachment';

const keyOf = (a: ServiceAttachment, thumb: boolean) =>
  a.kind === 'pdf' ? `${a.objectKey}.pdf` : `${a.objectKey}${thumb ? '-thumb' : ''}.webp`;

/**
 * Stores an uploaded photo (as WebP with a thumbnail) or PDF on a record, type checked by content;
 * the attachment keeps the uploaded file's name.
 * When the row cannot be written the stored objects are removed again.
 */
export async function attachToRecord(
  access: OrgAccess,
  record: ServiceRecord,
  file: { buffer: Buffer; originalname: string },
) {
  if (record.status === 'cancelled')
    throw new AppError(409, 'cancelled', 'This record is cancelled; it takes no attachments');
  const count = await ServiceAttachment.count({
    where: { organizationId: access.organization.id, serviceRecordId: record.id },
  });
  if (count >= ATTACHMENTS_PER_RECORD)
    throw invalid({ file: `A record holds at most ${ATTACHMENTS_PER_RECORD} attachments` });
  const prepared = await prepareAttachment(file.buffer, 'file');
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
  const original = cleanName(file.originalname);
  try {
    const attachment = await ServiceAttachment.create({
      organizationId: access.organization.id,
      machineId: record.machineId,
      serviceRecordId: record.id,
      kind: prepared.kind,
      contentType: prepared.contentType,
      // the name the person gave it (photo.png), though a photo is stored as WebP
      fileName: original,
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
    return attachment;
  } catch (err) {
    await Promise.allSettled(stored.map(deleteObject));
    throw err;
  }
}

async function loadAttachment(access: OrgAccess, record: ServiceRecord, attachmentId: string) {
  const a = await ServiceAttachment.findOne({
    where: {
      id: attachmentId,
      organizationId: access.organization.id,
      serviceRecordId: record.id,
    },
  });
  if (!a) throw notFound('Attachment');
  return a;
}

/** The stored file of an attachment (its thumbnail when asked; a PDF has none: 404). */
export async function attachmentFile(
  access: OrgAccess,
  record: ServiceRecord,
  attachmentId: string,
  thumb: boolean,
) {
  const a = await loadAttachment(access, record, attachmentId);
  if (thumb && a.kind === 'pdf') throw notFound('Thumbnail');
  // a download of a photo is named for what it holds: photo.png served as WebP saves as photo.webp
  const fileName = a.kind === 'image' ? `${a.fileName.replace(/\.[^.]*$/, '')}.webp` : a.fileName;
  return { object: await getObject(keyOf(a, thumb)), fileName };
}

/** Removes an attachment; its stored objects go after the row (a leftover object is harmless). */
export async function removeAttachment(
  access: OrgAccess,
  record: ServiceRecord,
  attachmentId: string,
) {
  const a = await loadAttachment(access, record, attachmentId);
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
}
