import type { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { MACHINE_CATEGORIES } from '../../../shared/constants';
import {
  builtInChecklistResponseSchema,
  checklistTemplateCreateSchema,
  checklistTemplateListResponseSchema,
  checklistTemplateResponseSchema,
  checklistTemplateUpdateSchema,
  checklistTemplateWithAbilitiesSchema,
} from '../../../shared/schemas/walkarounds';
import { authorize } from '../../policies/access';
import { canEditChecklists } from '../../policies/walkaround';
import { presentChecklistItem, presentChecklistTemplate } from '../../presenters/walkaround';
import {
  createChecklistTemplate,
  deleteChecklistTemplate,
  listChecklistTemplates,
  loadChecklistTemplate,
  updateChecklistTemplate,
} from '../../services/checklist-templates';
import { builtInChecklist } from '../../services/checklist-defaults';

const orgParams = z.object({ orgId: z.uuid() });
const templateParams = orgParams.extend({ templateId: z.uuid() });
const managerOnly = 'Only a manager may edit walkaround checklists';

/** Walkaround checklist templates: one per machine category, edited by the manager. */
export function registerChecklistTemplateRoutes(router: Router): void {
  route(router, {
    method: 'get',
    path: '/organizations/:orgId/checklist-templates',
    summary: "The farm's walkaround checklists (one per machine category)",
    tags: ['walkarounds'],
    params: orgParams,
    query: z.object({ category: z.enum(MACHINE_CATEGORIES).optional() }),
    response: checklistTemplateListResponseSchema,
    handler: async ({ req, query }) => {
      const access = req.access!;
      const rows = await listChecklistTemplates(access, query.category);
      return {
        data: rows.map(presentChecklistTemplate),
        abilities: { edit: canEditChecklists(access) },
      };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/checklist-templates/built-in/:category',
    summary:
      'The built-in checklist of a category (used where the farm has none; a starting point for a new template)',
    tags: ['walkarounds'],
    params: orgParams.extend({ category: z.enum(MACHINE_CATEGORIES) }),
    response: builtInChecklistResponseSchema,
    handler: ({ params }) => {
      const d = builtInChecklist(params.category);
      return {
        data: {
          category: params.category,
          name: d.name,
          description: d.description,
          items: d.items.map(presentChecklistItem),
        },
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/checklist-templates',
    summary:
      'Create the checklist of a machine category (manager). Item ids come from the labels when left out; cautions from the hazards when left empty',
    tags: ['walkarounds'],
    params: orgParams,
    body: checklistTemplateCreateSchema,
    status: 201,
    response: checklistTemplateResponseSchema,
    handler: async ({ req, body }) => {
      const access = req.access!;
      authorize(canEditChecklists(access), managerOnly);
      return { data: presentChecklistTemplate(await createChecklistTemplate(access, body)) };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/checklist-templates/:templateId',
    summary: 'One walkaround checklist',
    tags: ['walkarounds'],
    params: templateParams,
    response: checklistTemplateWithAbilitiesSchema,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const t = await loadChecklistTemplate(access, params.templateId);
      return { data: presentChecklistTemplate(t), abilities: { edit: canEditChecklists(access) } };
    },
  });

  route(router, {
    method: 'patch',
    path: '/organizations/:orgId/checklist-templates/:templateId',
    summary:
      'Edit a checklist (manager); items, when given, replace the list. Past walkarounds keep the items they were done with',
    tags: ['walkarounds'],
    params: templateParams,
    body: checklistTemplateUpdateSchema,
    response: checklistTemplateResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const t = await loadChecklistTemplate(access, params.templateId);
      authorize(canEditChecklists(access), managerOnly);
      return { data: presentChecklistTemplate(await updateChecklistTemplate(access, t, body)) };
    },
  });

  route(router, {
    method: 'delete',
    path: '/organizations/:orgId/checklist-templates/:templateId',
    summary: 'Remove a checklist (manager); its category falls back to the built-in list',
    tags: ['walkarounds'],
    params: templateParams,
    status: 204,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const t = await loadChecklistTemplate(access, params.templateId);
      authorize(canEditChecklists(access), managerOnly);
      await deleteChecklistTemplate(access, t);
    },
  });
}
