import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { bookingsQueryOptions } from '../../features/dealers/api/get-bookings';
import { dailyCareQueryOptions } from '../../features/due/api/get-daily-care';
import { dueQueryOptions } from '../../features/due/api/get-due';
import { readDueFilters } from '../../features/due/filters';
import { firstRunChecklistQueryOptions } from '../../features/onboarding/api/first-run-checklist';
import { findMembership, meQueryOptions, rememberedOrganizationKind } from '../../lib/auth';

// The dashboard's loader lives in the first file the browser fetches (not in the page's module),
// so the router calls it at once, beside the session probe and while the page's module is still
// on its way; the page's module only brings the components.

// A dealer's board is another role's screen: fetched only when a dealer's dashboard opens.
export const loadDealerBoard = () => import('./dealer-board');

/** Who on a farm sees the dealers' proposals (the bookings page's roles). */
export const SEES_BOOKINGS = new Set(['manager', 'technician']);

/**
 * Starts every read of a farm's dashboard with the page, each on its own: the due list and the
 * daily care beside the session when this farm was opened here before, the bookings and the
 * first-run checklist as soon as the session names the role. Nothing waits for another; each
 * section shows when its own answer is there.
 */
export const dashboardLoader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    const orgId = params.orgId ?? '';
    const filters = readDueFilters(new URL(request.url).searchParams);
    const farmReads = () => {
      void queryClient.prefetchQuery(dueQueryOptions(orgId, filters));
      void queryClient.prefetchQuery(dailyCareQueryOptions(orgId));
    };
    // On a cold start the session is not known yet: a farm opened here before gets its reads
    // asked for beside the session, not one round trip after it, and only once.
    const sessionKnown = queryClient.getQueryData(meQueryOptions().queryKey) !== undefined;
    const early = !sessionKnown && rememberedOrganizationKind(orgId) === 'farm';
    if (early) farmReads();
    const me = await queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
    const membership = me ? findMembership(me, orgId) : undefined;
    if (membership?.organization.kind === 'farm') {
      if (!early) farmReads();
      if (SEES_BOOKINGS.has(membership.role))
        void queryClient.prefetchQuery(bookingsQueryOptions(orgId));
      if (membership.role === 'manager')
        void queryClient.prefetchQuery(firstRunChecklistQueryOptions(orgId));
    }
    // a dealer's dashboard is its board across customers
    if (membership?.organization.kind === 'dealer') {
      const { dealerBoardLoader } = await loadDealerBoard();
      return dealerBoardLoader(queryClient)({ request, params } as LoaderFunctionArgs);
    }
    return null;
  };
