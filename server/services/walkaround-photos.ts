import { randomUUID } from 'node:crypto';
import { AppError, notFound } from '../errors';
import { WalkaroundPhoto, type Machine } from '../models';
import type { OrgAccess } from '../policies/access';
import { getObject, putObject } from '../infra/storage';
import { prepareImage } from '../infra/images';
import { loadMachine } from './machines';

/**
 * Stores an uploaded walkaround photo (checked by content, as WebP with a thumbnail); the
 * walkaround claims it by id later. A sold machine takes none (409).
 */
export async function storeWalkaroundPhoto(access: OrgAccess, machine: Machine, upload: Buffer) {
  if (machine.status === 'sold')
    throw new AppError(409, 'machine_sold', `${machine.fleetNumber} is sold`);
  const { full, thumb, contentType } = await prepareImage(upload, 'photo');
  const key = `org/${access.organization.id}/walkarounds/${machine.id}/${randomUUID()}`;
  await putObject(`${key}.webp`, full, contentType);
  await putObject(`${key}-thumb.webp`, thumb, contentType);
  return WalkaroundPhoto.create({
    id: randomUUID(),
    organizationId: access.organization.id,
    machineId: machine.id,
    walkaroundId: null,
    objectKey: key,
    uploadedBy: access.userId,
  });
}

/** A walkaround photo's stored file (or its thumbnail), to people who may see the machine; else 404. */
export async function walkaroundPhotoFile(access: OrgAccess, photoId: string, thumb: boolean) {
  const photo = await WalkaroundPhoto.findOne({
    where: { id: photoId, organizationId: access.organization.id },
  });
  if (!photo) throw notFound('Photo');
  await loadMachine(access, photo.machineId).catch(() => {
    throw notFound('Photo');
  });
  return getObject(`${photo.objectKey}${thumb ? '-thumb' : ''}.webp`);
}
