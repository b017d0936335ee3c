import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  organizationCreateSchema,
  organizationDeleteSchema,
  organizationResponseSchema,
  organizationUpdateSchema,
} from '../../../shared/schemas/organizations';
import { authorize } from '../../policies/access';
import {
  canDeleteOrganization,
  canUpdateOrganization,
  canViewOrganization,
  managingRole,
} from '../../policies/organization';
import { organizationAbilities, presentOrganizationSettings } from '../../presenters/organization';
import type { OrgAccess } from '../../policies/access';
import {
  createOrganization,
  deleteOrganization,
  updateOrganization,
} from '../../services/organizations';

const orgParams = z.object({ orgId: z.uuid() });

const runsIt = (kind: 'farm' | 'dealer') =>
  `Only the ${kind === 'farm' ? "farm's manager" : "dealer's advisor"} may change this`;

export function organizationsRouter(): Router {
  const router = Router();

  route(router, {
    method: 'post',
    path: '/organizations',
    summary:
      'Create a farm (name, time zone, units, currency, labour rate, season months) or a dealer (name, time zone, currency); the creator becomes its manager or advisor',
    tags: ['organizations'],
    access: 'user',
    status: 201,
    body: organizationCreateSchema,
    response: organizationResponseSchema,
    handler: async ({ req, body }) => {
      const user = req.auth!.user;
      const organization = await createOrganization(user.id, body);
      const access: OrgAccess = {
        organization,
        userId: user.id,
        role: managingRole(organization.kind),
        via: 'member',
      };
      return {
        data: presentOrganizationSettings(organization),
        abilities: organizationAbilities(access),
      };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId',
    summary: "The organization's settings, with what the caller may do with them",
    tags: ['organizations'],
    params: orgParams,
    response: organizationResponseSchema,
    handler: ({ req }) => {
      const access = req.access!;
      authorize(canViewOrganization(access));
      return {
        data: presentOrganizationSettings(access.organization),
        abilities: organizationAbilities(access),
      };
    },
  });

  route(router, {
    method: 'patch',
    path: '/organizations/:orgId',
    summary:
      "Change the organization's settings (only the fields sent); units, labour rate, season months and digest hour are a farm's only",
    tags: ['organizations'],
    params: orgParams,
    body: organizationUpdateSchema,
    response: organizationResponseSchema,
    handler: async ({ req, body }) => {
      const access = req.access!;
      authorize(canUpdateOrganization(access), runsIt(access.organization.kind));
      const organization = await updateOrganization(access, body);
      return {
        data: presentOrganizationSettings(organization),
        abilities: organizationAbilities(access),
      };
    },
  });

  route(router, {
    method: 'delete',
    path: '/organizations/:orgId',
    summary:
      "Delete the organization with all its data and stored files, confirmed by its name typed out; linked dealers (or a dealer's farms) are told by e-mail",
    tags: ['organizations'],
    params: orgParams,
    body: organizationDeleteSchema,
    status: 204,
    handler: async ({ req, body }) => {
      const access = req.access!;
      authorize(canDeleteOrganization(access), runsIt(access.organization.kind));
      await deleteOrganization(access, body.confirmName);
    },
  });

  return router;
}
