import type { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  auditQuerySchema,
  customerInvitationSchema,
  dealerInvitationAcceptSchema,
  dealerInvitationSchema,
  dealerLinkUpdateSchema,
} from '../../../shared/schemas/dealers';
import { authorize } from '../../policies/access';
import {
  canInviteCustomers,
  canManageDealerLinks,
  canUseDealerBoard,
  canViewAuditLog,
} from '../../policies/dealer-link';
import { presentCustomer, presentFarmLink } from '../../presenters/dealer';
import {
  auditLogResponseSchema,
  customerResponseSchema,
  customersResponseSchema,
  dealerInvitationResponseSchema,
  farmDealerLinkResponseSchema,
  farmDealerLinksResponseSchema,
} from '../../../shared/schemas/dealer-responses';
import {
  changeLinkAccess,
  farmDealerChoices,
  grantDealer,
  listCustomers,
  listFarmDealers,
  revokeLink,
} from '../../services/dealer-links';
import {
  acceptDealerInvitation,
  describeDealerInvitation,
  inviteCustomer,
  withdrawCustomerInvitation,
} from '../../services/dealer-invitations';
import { farmAuditEvents } from '../../services/dealer-activity';
import { orgParams, requireDealerOrg, requireFarmOrg } from './sides';

const linkParams = orgParams.extend({ linkId: z.uuid() });
const tokenParams = z.object({ token: z.string().min(20).max(200) });
const managersOnly = 'Only a farm manager may grant, change or revoke dealer access';

/** Dealer links: the dealer's customers and requests, the farm's dealers, the audit log. */
export function registerLinkRoutes(router: Router): void {
  route(router, {
    method: 'get',
    path: '/organizations/:orgId/customers',
    summary: "The dealer's customers (active links) and its requests waiting for a farm manager",
    tags: ['dealers'],
    params: orgParams,
    response: customersResponseSchema,
    handler: async ({ req }) => {
      const access = requireDealerOrg(req.access);
      authorize(canUseDealerBoard(access));
      const rows = await listCustomers(access);
      return {
        data: rows.map((r) => presentCustomer(r.link, r.machineCount)),
        abilities: { invite: canInviteCustomers(access) },
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/customer-invitations',
    summary:
      'Ask a farm for access: e-mails the farm manager a single-use link; the manager picks the farm and the access',
    tags: ['dealers'],
    params: orgParams,
    body: customerInvitationSchema,
    status: 201,
    response: customerResponseSchema,
    handler: async ({ req, body }) => {
      const access = requireDealerOrg(req.access);
      authorize(canInviteCustomers(access), 'Only a service advisor may invite customers');
      return { data: presentCustomer(await inviteCustomer(access, body), 0) };
    },
  });

  route(router, {
    method: 'delete',
    path: '/organizations/:orgId/customer-invitations/:linkId',
    summary: 'Withdraw a request the farm has not answered',
    tags: ['dealers'],
    params: linkParams,
    status: 204,
    handler: async ({ req, params }) => {
      const access = requireDealerOrg(req.access);
      authorize(canInviteCustomers(access));
      await withdrawCustomerInvitation(access, params.linkId);
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/dealers',
    summary: "The farm's dealer links: active ones with their access, then revoked ones",
    tags: ['dealers'],
    params: orgParams,
    response: farmDealerLinksResponseSchema,
    handler: async ({ req }) => {
      const access = requireFarmOrg(req.access);
      authorize(canManageDealerLinks(access), managersOnly);
      const links = await listFarmDealers(access);
      return {
        data: links.map((l) => presentFarmLink(l, true)),
        abilities: { invite: true },
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/dealers',
    summary:
      "Grant a dealer access by one of its service advisors' e-mail (active at once; the advisor is told by e-mail)",
    tags: ['dealers'],
    params: orgParams,
    body: dealerInvitationSchema,
    status: 201,
    response: farmDealerLinkResponseSchema,
    handler: async ({ req, body }) => {
      const access = requireFarmOrg(req.access);
      authorize(canManageDealerLinks(access), managersOnly);
      return { data: presentFarmLink(await grantDealer(access, body), true) };
    },
  });

  route(router, {
    method: 'patch',
    path: '/organizations/:orgId/dealers/:linkId',
    summary:
      "Change a dealer's access (view or service); it applies from the dealer's next request",
    tags: ['dealers'],
    params: linkParams,
    body: dealerLinkUpdateSchema,
    response: farmDealerLinkResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = requireFarmOrg(req.access);
      authorize(canManageDealerLinks(access), managersOnly);
      return {
        data: presentFarmLink(await changeLinkAccess(access, params.linkId, body.access), true),
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/dealers/:linkId/revoke',
    summary: "Revoke a dealer's access: its next request to the farm answers 404",
    tags: ['dealers'],
    params: linkParams,
    response: farmDealerLinkResponseSchema,
    handler: async ({ req, params }) => {
      const access = requireFarmOrg(req.access);
      authorize(canManageDealerLinks(access), managersOnly);
      return { data: presentFarmLink(await revokeLink(access, params.linkId), true) };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/audit-events',
    summary:
      "The farm's audit log, newest first; each event names the dealer its actor acted for (filter by dealer, or via=dealer)",
    tags: ['dealers'],
    params: orgParams,
    query: auditQuerySchema,
    response: auditLogResponseSchema,
    handler: async ({ req, query }) => {
      const access = requireFarmOrg(req.access);
      authorize(canViewAuditLog(access), 'Only a farm manager may read the audit log');
      const { total, events } = await farmAuditEvents(access, query);
      const dealers = await farmDealerChoices(access);
      return { data: events, meta: { total, page: query.page, pageSize: query.pageSize }, dealers };
    },
  });

  route(router, {
    method: 'get',
    path: '/dealer-invitations/:token',
    summary:
      "A dealer's request for access, for the farm manager who opened the e-mailed link: the dealer and the farms the caller manages",
    tags: ['dealers'],
    access: 'user',
    params: tokenParams,
    response: dealerInvitationResponseSchema,
    handler: async ({ req, params }) => {
      const { link, farms, linkedFarmIds } = await describeDealerInvitation(
        req.auth!,
        params.token,
      );
      return {
        data: {
          dealer: { id: link.dealerOrganizationId, name: link.dealer?.name ?? '' },
          invitedEmail: link.invitedEmail,
          message: link.message,
          expiresAt: link.expiresAt?.toISOString() ?? null,
          farms: farms.map((f) => ({ id: f.id, name: f.name, linked: linkedFarmIds.has(f.id) })),
        },
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/dealer-invitations/:token/accept',
    summary:
      "Accept a dealer's request for one of the farms the caller manages, choosing view or service access (the link works once)",
    tags: ['dealers'],
    access: 'user',
    params: tokenParams,
    body: dealerInvitationAcceptSchema,
    response: farmDealerLinkResponseSchema,
    handler: async ({ req, params, body }) => {
      const { link } = await acceptDealerInvitation(req.auth!, params.token, body);
      return { data: presentFarmLink(link, true) };
    },
  });
}
