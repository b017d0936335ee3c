import { Router, type Request } from 'express';
import { route } from '../route';
import {
  dealerOutlookQuerySchema,
  dealerOutlookResponseSchema,
  shopOutlookQuerySchema,
  shopOutlookResponseSchema,
} from '../../../shared/schemas/shop-outlook';
import { authorize } from '../../policies/access';
import { canUseDealerBoard } from '../../policies/dealer-link';
import { canViewShopWeek } from '../../policies/service-record';
import { dealerOutlook, shopOutlook } from '../../services/shop-outlook';
import { orgParams, requireDealerOrg } from '../dealers/sides';

const pathOf = (req: Request) => req.originalUrl.split('?')[0];

/** The shop's next weeks: the farm's own (its shop) and the dealer's across its customers. */
export function shopOutlookRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/shop-outlook',
    summary:
      "The farm shop's next weeks (1-26, default 16, from this Monday): per ISO week the services the forecast brings due (overdue in the first week), their labour hours, parts and fluids, beside the visits already planned",
    tags: ['services'],
    params: orgParams,
    query: shopOutlookQuerySchema,
    response: shopOutlookResponseSchema,
    handler: async ({ req, query }) => {
      const access = req.access!;
      // the same people as the shop week: its managers and technicians
      authorize(canViewShopWeek(access), 'The shop outlook is for technicians and managers');
      return { data: await shopOutlook(access, query) };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/customer-outlook',
    summary:
      "The dealer's next weeks across its linked customers (or one): per ISO week the services coming due, their labour hours, parts and fluids, beside the visits planned on customers with a service link",
    tags: ['dealers'],
    params: orgParams,
    query: dealerOutlookQuerySchema,
    response: dealerOutlookResponseSchema,
    handler: async ({ req, query }) => {
      const access = requireDealerOrg(req.access);
      authorize(canUseDealerBoard(access), 'Only a service advisor uses the outlook');
      return { data: await dealerOutlook(access, query, pathOf(req)) };
    },
  });

  return router;
}
