import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';

/** DELETE a farm checklist: its category goes back to the built-in list. */
export const deleteTemplate = (orgId: string, templateId: string) =>
  apiClient.delete(`/organizations/${segment(orgId)}/checklist-templates/${segment(templateId)}`);

export function useDeleteTemplate(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (templateId: string) => deleteTemplate(orgId, templateId),
    onSuccess: () => invalidate(queryClient, changedBy.checklistTemplates(orgId)),
  });
}
