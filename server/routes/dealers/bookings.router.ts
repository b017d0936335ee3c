import type { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  bookingCreateSchema,
  bookingDecisionSchema,
  bookingListQuerySchema,
} from '../../../shared/schemas/dealers';
import { notFound } from '../../errors';
import type { ServiceBooking } from '../../models';
import { authorize, type OrgAccess } from '../../policies/access';
import { canDecideBookings, canListBookings, canProposeBookings } from '../../policies/dealer-link';
import { presentBookings } from '../../presenters/dealer';
import {
  bookingResponseSchema,
  bookingsResponseSchema,
} from '../../../shared/schemas/dealer-responses';
import { bookingOrganizationNames, bookingOverlaps, listBookings } from '../../services/bookings';
import { proposeBooking } from '../../services/booking-proposals';
import { acceptBooking, cancelBooking, declineBooking } from '../../services/booking-decisions';
import { orgParams } from './sides';

const bookingParams = orgParams.extend({ bookingId: z.uuid() });
const one = bookingResponseSchema;

/** Bookings are reached as a member of either side; a dealer link does not reach them. */
function side(access: OrgAccess | undefined): OrgAccess {
  if (!access || access.via !== 'member') throw notFound('Page');
  return access;
}

const abilitiesFor = (access: OrgAccess) => (b: ServiceBooking) => {
  const open = b.status === 'proposed';
  const dealer = access.organization.kind === 'dealer';
  return {
    accept: open && !dealer && canDecideBookings(access),
    decline: open && !dealer && canDecideBookings(access),
    cancel: open && dealer && canProposeBookings(access),
  };
};

async function present(access: OrgAccess, bookings: ServiceBooking[]) {
  const [names, overlaps] = await Promise.all([
    bookingOrganizationNames(bookings),
    bookingOverlaps(access, bookings),
  ]);
  return presentBookings(bookings, names, abilitiesFor(access), overlaps);
}

/** Service bookings: the dealer proposes, the farm manager accepts (planned records) or declines. */
export function registerBookingRoutes(router: Router): void {
  route(router, {
    method: 'get',
    path: '/organizations/:orgId/bookings',
    summary:
      "Service bookings of this organization: a dealer's proposals to its customers, or those a farm received; soonest date first",
    tags: ['dealers'],
    params: orgParams,
    query: bookingListQuerySchema,
    response: bookingsResponseSchema,
    handler: async ({ req, query }) => {
      const access = side(req.access);
      authorize(canListBookings(access), 'Your role does not see bookings');
      return {
        data: await present(access, await listBookings(access, query)),
        abilities: { propose: canProposeBookings(access) },
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/bookings',
    summary:
      "Propose a service date to a linked customer: machines, their tasks and a note; the farm's managers are told by e-mail",
    tags: ['dealers'],
    params: orgParams,
    body: bookingCreateSchema,
    status: 201,
    response: one,
    handler: async ({ req, body }) => {
      const access = side(req.access);
      if (access.organization.kind !== 'dealer') throw notFound('Page');
      authorize(canProposeBookings(access), 'Only a service advisor proposes bookings');
      const [data] = await present(access, [await proposeBooking(access, body)]);
      return { data };
    },
  });

  const decision = (action: 'accept' | 'decline', summary: string, run: typeof acceptBooking) =>
    route(router, {
      method: 'post',
      path: `/organizations/:orgId/bookings/:bookingId/${action}`,
      summary,
      tags: ['dealers'],
      params: bookingParams,
      body: bookingDecisionSchema,
      response: one,
      handler: async ({ req, params, body }) => {
        const access = side(req.access);
        if (access.organization.kind !== 'farm') throw notFound('Booking');
        authorize(canDecideBookings(access), 'Only a farm manager accepts or declines bookings');
        const [data] = await present(access, [await run(access, params.bookingId, body.note)]);
        return { data };
      },
    });
  decision(
    'accept',
    "Accept a proposal: each machine gets a planned service record on the date with the booking's tasks (one transaction)",
    acceptBooking,
  );
  decision('decline', 'Decline a proposal, with an optional note to the dealer', declineBooking);

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/bookings/:bookingId/cancel',
    summary: 'Withdraw a proposal the farm has not answered (the dealer)',
    tags: ['dealers'],
    params: bookingParams,
    response: one,
    handler: async ({ req, params }) => {
      const access = side(req.access);
      if (access.organization.kind !== 'dealer') throw notFound('Booking');
      authorize(canProposeBookings(access));
      const [data] = await present(access, [await cancelBooking(access, params.bookingId)]);
      return { data };
    },
  });
}
