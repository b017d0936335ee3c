import { apiClient, segment } from '../../../lib/api-client';
import type { UploadedPhoto } from './types';

/** POST …/machines/:machineId/walkaround-photos (multipart field `photo`) → the photo's id. */
export async function uploadWalkaroundPhoto(
  orgId: string,
  machineId: string,
  file: File,
): Promise<UploadedPhoto> {
  const path = `/organizations/${segment(orgId)}/machines/${segment(machineId)}/walkaround-photos`;
  return (await apiClient.upload<{ data: UploadedPhoto }>(path, 'photo', file)).data;
}
