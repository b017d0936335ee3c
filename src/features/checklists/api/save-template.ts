import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChecklistTemplateCreateInput } from '../../../../shared/schemas/walkarounds';
import { apiClient, segment } from '../../../lib/api-client';
import { checklistKeys, walkaroundChecklistsKey } from './keys';
import type { ChecklistTemplate } from './types';

/** POST a category's first farm checklist, or PATCH the existing one (items replace the list). */
export const saveTemplate = (
  orgId: string,
  templateId: string | null,
  input: ChecklistTemplateCreateInput,
) =>
  (templateId
    ? apiClient.patch<{ data: ChecklistTemplate }>(
        `/organizations/${segment(orgId)}/checklist-templates/${segment(templateId)}`,
        input,
      )
    : apiClient.post<{ data: ChecklistTemplate }>(
        `/organizations/${segment(orgId)}/checklist-templates`,
        input,
      )
  ).then((body) => body.data);

export function useSaveTemplate(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({
      templateId,
      input,
    }: {
      templateId: string | null;
      input: ChecklistTemplateCreateInput;
    }) => saveTemplate(orgId, templateId, input),
    onSuccess: () =>
      Promise.all(
        [checklistKeys.list(orgId), walkaroundChecklistsKey].map((queryKey) =>
          queryClient.invalidateQueries({ queryKey }),
        ),
      ),
  });
}
