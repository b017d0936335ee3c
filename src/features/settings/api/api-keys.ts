import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type {
  ApiKeyCreateInput,
  apiKeyCreatedResponseSchema,
  apiKeyListResponseSchema,
} from '../../../../shared/schemas/api-keys';
import { apiClient, segment } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export type { ApiKey, ApiKeyCreated } from '../../../../shared/schemas/api-keys';

const keysPath = (orgId: string) => `/organizations/${segment(orgId)}/api-keys`;

/** The farm's machine-data keys, newest first (revoked ones included). */
export const useApiKeys = (orgId: string) =>
  useQuery({
    queryKey: queryKeys.apiKeys.list(orgId),
    queryFn: ({ signal }) =>
      apiClient.get<z.infer<typeof apiKeyListResponseSchema>>(keysPath(orgId), { signal }),
    select: (res) => res.data,
  });

/** Makes a key; the answer carries its secret, which the list never shows again. */
export function useCreateApiKey(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Pick<ApiKeyCreateInput, 'name'>) =>
      apiClient.post<z.infer<typeof apiKeyCreatedResponseSchema>>(keysPath(orgId), input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.apiKeys.list(orgId) }),
  });
}

export function useRevokeApiKey(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (keyId: string) => apiClient.delete(`${keysPath(orgId)}/${segment(keyId)}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.apiKeys.list(orgId) }),
  });
}
