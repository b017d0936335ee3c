import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';

const photoPath = (orgId: string, machineId: string) =>
  `/organizations/${segment(orgId)}/machines/${segment(machineId)}/photo`;

/** Uploads or replaces the machine's photo (manager; JPEG, PNG, WebP or HEIC, checked by content). */
export function useUploadMachinePhoto(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => apiClient.upload(photoPath(orgId, machineId), 'photo', file, 'PUT'),
    onSuccess: () => invalidate(queryClient, changedBy.machinePhoto(orgId, machineId)),
  });
}

export function useRemoveMachinePhoto(orgId: string, machineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiClient.delete(photoPath(orgId, machineId)),
    onSuccess: () => invalidate(queryClient, changedBy.machinePhoto(orgId, machineId)),
  });
}
