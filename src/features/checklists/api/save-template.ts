import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type {
  ChecklistTemplateCreateInput,
  checklistTemplateUpdateSchema,
} from '../../../../shared/schemas/walkarounds';
import { apiClient, segment } from '../../../lib/api-client';
import type { ChecklistTemplate } from './types';
import { changedBy, invalidate } from '../../../lib/invalidation';

/** A category's first farm checklist (every field), or the fields changed on the existing one. */
export type SaveTemplateInput =
  | { templateId: null; input: ChecklistTemplateCreateInput }
  | { templateId: string; input: z.input<typeof checklistTemplateUpdateSchema> };

/** POST a category's first farm checklist, or PATCH the existing one (items replace the list). */
export const saveTemplate = (orgId: string, { templateId, input }: SaveTemplateInput) =>
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
    mutationFn: (save: SaveTemplateInput) => saveTemplate(orgId, save),
    onSuccess: () => invalidate(queryClient, changedBy.checklistTemplates(orgId)),
  });
}
