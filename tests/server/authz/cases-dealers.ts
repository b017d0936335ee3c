// How the matrix calls the dealer routes: the farm's dealers (links, the audit log, a dealer's
// request), and the dealer's own side (customers, board, parts, reminders, bookings).
import { randomUUID } from 'node:crypto';
import { isDealer } from './callers';
import { onFarm, type Case, type Ctx } from './cases-fleet';
import { freshAdvisor, freshDealerLink, freshRequest } from './fresh';
import { inDays, pendingRequest, proposal } from './seed-kit';

/** Dealer-side routes: each advisor addresses its own dealer, everyone else the farm. */
const home = (c: Ctx) => ({
  orgId: isDealer(c.caller) ? c.w.dealers[c.caller as 'viewDealer'].id : c.w.farm.org.id,
});
const dealerOf = (c: Ctx) => c.w.dealers[c.caller as 'viewDealer'];
/** The organization the caller manages or works for: where it may accept a dealer's request. */
const ownOrganization = (c: Ctx) =>
  isDealer(c.caller)
    ? dealerOf(c).id
    : c.caller === 'stranger'
      ? c.w.other.org.id
      : c.w.farm.org.id;

/** A farm the caller does not manage (the stranger manages the other farm). */
const notManaged = (c: Ctx) => (c.caller === 'stranger' ? c.w.farm.org.id : c.w.other.org.id);

export const DEALER_CASES: Record<string, Case> = {
  // the farm's dealers
  'GET /organizations/{orgId}/dealers': { ids: 'none', build: (c) => ({ params: onFarm(c) }) },
  'POST /organizations/{orgId}/dealers': {
    ids: 'none',
    build: async (c) => ({
      params: onFarm(c),
      body: {
        email: (c.succeeds ? await freshAdvisor() : c.w.users.unlinkedDealer).email,
        access: 'view',
      },
    }),
  },
  'PATCH /organizations/{orgId}/dealers/{linkId}': {
    ids: 'path',
    build: async (c) => ({
      params: {
        ...onFarm(c),
        linkId: c.succeeds ? (await freshDealerLink(c.rec)).link.id : c.rec.linkId,
      },
      body: { access: c.succeeds ? 'service' : 'view' },
    }),
  },
  'POST /organizations/{orgId}/dealers/{linkId}/revoke': {
    ids: 'path',
    build: async (c) => ({
      params: {
        ...onFarm(c),
        linkId: c.succeeds ? (await freshDealerLink(c.rec)).link.id : c.rec.linkId,
      },
    }),
  },
  'GET /organizations/{orgId}/audit-events': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c) }),
  },
  'GET /organizations/{orgId}/export': { ids: 'none', build: (c) => ({ params: onFarm(c) }) },
  'GET /dealer-invitations/{token}': {
    ids: 'none',
    build: async () => ({ params: { token: (await freshRequest()).token } }),
  },
  'POST /dealer-invitations/{token}/accept': {
    ids: 'field',
    build: async (c) => ({
      params: { token: (await freshRequest()).token },
      body: {
        organizationId: c.side === 'own' ? ownOrganization(c) : notManaged(c),
        access: 'view',
      },
    }),
  },
  // the dealer's side
  'GET /organizations/{orgId}/customers': { ids: 'none', build: (c) => ({ params: home(c) }) },
  'POST /organizations/{orgId}/customer-invitations': {
    ids: 'none',
    build: (c) => ({ params: home(c), body: { email: 'a.farm.manager@test.example' } }),
  },
  'DELETE /organizations/{orgId}/customer-invitations/{linkId}': {
    ids: 'path',
    build: async (c) => ({
      params: {
        ...home(c),
        linkId: c.succeeds
          ? (await pendingRequest(dealerOf(c), c.w.users[c.caller as 'viewDealer'])).id
          : c.w.otherDealerRequestId,
      },
    }),
  },
  'GET /organizations/{orgId}/board': { ids: 'none', build: (c) => ({ params: home(c) }) },
  'GET /organizations/{orgId}/board.csv': { ids: 'none', build: (c) => ({ params: home(c) }) },
  'GET /organizations/{orgId}/parts-forecast': {
    ids: 'none',
    build: (c) => ({ params: home(c) }),
  },
  'GET /organizations/{orgId}/parts-forecast.csv': {
    ids: 'none',
    build: (c) => ({ params: home(c) }),
  },
  'GET /organizations/{orgId}/customer-outlook': {
    ids: 'none',
    build: (c) => ({ params: home(c), query: { weeks: '4' } }),
  },
  'GET /organizations/{orgId}/customers/{customerId}/reminder-draft': {
    // the customer is checked as an input: one not linked is refused by name (422)
    ids: 'field',
    build: (c) => ({
      params: { ...home(c), customerId: c.rec.org.id },
      query: { taskIds: c.rec.task.id },
    }),
  },
  'POST /organizations/{orgId}/customers/{customerId}/reminders': {
    // the customer is checked as an input: one not linked is refused by name (422)
    ids: 'field',
    build: (c) => ({
      params: { ...home(c), customerId: c.rec.org.id },
      body: {
        taskIds: [c.rec.task.id],
        subject: 'Service coming due',
        body: 'Your tractor is coming due for its oil change.',
        requestId: randomUUID(),
      },
    }),
  },
  'GET /organizations/{orgId}/bookings': { ids: 'none', build: (c) => ({ params: home(c) }) },
  'POST /organizations/{orgId}/bookings': {
    ids: 'field',
    build: (c) => ({
      params: home(c),
      body: {
        customerId: c.rec.org.id,
        proposedFor: inDays(10),
        items: [{ machineId: c.rec.machine.id, taskIds: [c.rec.task.id] }],
      },
    }),
  },
  'POST /organizations/{orgId}/bookings/{bookingId}/accept': {
    ids: 'path',
    build: async (c) => ({
      params: { ...onFarm(c), bookingId: await answerable(c) },
      body: { note: 'See you on the day' },
    }),
  },
  'POST /organizations/{orgId}/bookings/{bookingId}/decline': {
    ids: 'path',
    build: async (c) => ({
      params: { ...onFarm(c), bookingId: await answerable(c) },
      body: { note: 'We are harvesting that week' },
    }),
  },
  'POST /organizations/{orgId}/bookings/{bookingId}/cancel': {
    ids: 'path',
    build: async (c) => ({
      params: {
        ...home(c),
        bookingId: c.succeeds
          ? await proposal(c.w.farm, dealerOf(c), c.w.users[c.caller as 'viewDealer'])
          : c.rec.bookingId,
      },
    }),
  },
};

/** A proposal waiting for the farm: a new one from the service dealer when the cell is to answer it. */
async function answerable(c: Ctx) {
  if (!c.succeeds) return c.rec.bookingId;
  return proposal(c.rec, c.w.dealers.serviceDealer, c.w.users.serviceDealer);
}
