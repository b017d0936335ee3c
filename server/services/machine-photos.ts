// A machine's photo: a full image and a thumbnail in the object store under a fresh key per
// upload; the machine row names the key. Old objects are removed after the row changes.
import { randomUUID } from 'node:crypto';
import { notFound } from '../errors';
import type { Machine } from '../models';
import type { OrgAccess } from '../policies/context';
import { recordAudit } from '../infra/audit';
import { prepareImage } from '../infra/images';
import { deleteObject, getObject, putObject } from '../infra/storage';

const removeObjects = (key: string) =>
  Promise.allSettled([deleteObject(`${key}.webp`), deleteObject(`${key}-thumb.webp`)]);

/** Stores an uploaded photo (checked and converted by content) as the machine's; audited. */
export async function setMachinePhoto(access: OrgAccess, machine: Machine, upload: Buffer) {
  const { full, thumb, contentType } = await prepareImage(upload, 'photo');
  const key = `org/${access.organization.id}/machines/${machine.id}/${randomUUID()}`;
  await putObject(`${key}.webp`, full, contentType);
  await putObject(`${key}-thumb.webp`, thumb, contentType);
  const previous = machine.photoKey;
  await machine.update({ photoKey: key });
  await recordAudit({
    organizationId: access.organization.id,
    actorUserId: access.userId,
    action: 'machine.photo',
    entityType: 'machine',
    entityId: machine.id,
  });
  if (previous) await removeObjects(previous);
}

/** The stored photo or its thumbnail, to stream; 404 when the machine has none. */
export async function openMachinePhoto(machine: Machine, size: 'full' | 'thumb') {
  if (!machine.photoKey) throw notFound('Photo');
  return getObject(`${machine.photoKey}${size === 'thumb' ? '-thumb' : ''}.webp`);
}

/** Removes the machine's photo; 404 when it has none. */
export async function removeMachinePhoto(machine: Machine) {
  if (!machine.photoKey) throw notFound('Photo');
  const key = machine.photoKey;
  await machine.update({ photoKey: null });
  await removeObjects(key);
}
