// How the matrix calls the routes around the farm's work: accounts and sign-in, the team,
// messages and reminders, calendar feeds.
import { feedToken } from '../../../server/services/calendar';
import { unsubscribeToken } from '../../../server/services/unsubscribe-tokens';
import { TEST_PASSWORD } from '../../support/factories';
import { onFarm, type Case, type Ctx } from './cases-fleet';
import { freshFeed, freshInvitation, freshMember, freshResetToken } from './fresh';
import { sessionCookie } from './harness';

let n = 0;
const NEW_PASSWORD = 'a-long-new-passphrase';
/** Whom the caller is; anonymous callers use the farm manager's credentials. */
const person = (c: Ctx) => (c.caller === 'anonymous' ? c.w.farm.manager : c.w.users[c.caller]);
export const ORG_CASES: Record<string, Case> = {
  'POST /auth/sign-in': {
    ids: 'none',
    build: (c) => ({ params: {}, body: { email: person(c).email, password: TEST_PASSWORD } }),
  },
  'POST /auth/sign-out': {
    ids: 'none',
    // a session of its own: signing out must not end the one the other cells use
    build: async (c) => ({
      params: {},
      cookie: c.caller === 'anonymous' ? null : await sessionCookie(person(c)),
    }),
  },
  'POST /auth/password': {
    ids: 'none',
    build: () => ({
      params: {},
      body: { currentPassword: TEST_PASSWORD, password: TEST_PASSWORD },
    }),
  },
  'GET /me': { ids: 'none', build: () => ({ params: {} }) },
  'GET /session': { ids: 'none', build: () => ({ params: {} }) },
  'POST /auth/password-reset': {
    ids: 'none',
    build: (c) => ({ params: {}, body: { email: person(c).email } }),
  },
  'POST /auth/password-reset/confirm': {
    ids: 'none',
    build: async () => ({
      params: {},
      body: { token: await freshResetToken(), password: NEW_PASSWORD },
    }),
  },
  'GET /invitations/{token}': {
    ids: 'none',
    build: async (c) => ({ params: { token: (await freshInvitation(c.w.farm.org)).token } }),
  },
  'POST /invitations/{token}/accept': {
    ids: 'none',
    build: async (c) => ({
      params: { token: (await freshInvitation(c.w.farm.org)).token },
      body: { name: 'New Person', password: NEW_PASSWORD },
    }),
  },
  'GET /dev/mail': { ids: 'none', build: () => ({ params: {} }) },
  // the team
  'GET /organizations/{orgId}/members': { ids: 'none', build: (c) => ({ params: onFarm(c) }) },
  'PATCH /organizations/{orgId}/members/{id}': {
    ids: 'path',
    build: async (c) => ({
      params: { ...onFarm(c), id: c.succeeds ? await freshMember(c.rec) : c.rec.memberId },
      body: { role: 'technician' },
    }),
  },
  'DELETE /organizations/{orgId}/members/{id}': {
    ids: 'path',
    build: async (c) => ({
      params: { ...onFarm(c), id: c.succeeds ? await freshMember(c.rec) : c.rec.memberId },
    }),
  },
  'GET /organizations/{orgId}/invitations': { ids: 'none', build: (c) => ({ params: onFarm(c) }) },
  'POST /organizations/{orgId}/invitations': {
    ids: 'none',
    build: (c) => ({
      params: onFarm(c),
      body: { email: `new.person${++n}@test.example`, name: 'New Person', role: 'operator' },
    }),
  },
  'DELETE /organizations/{orgId}/invitations/{id}': {
    ids: 'path',
    build: async (c) => ({
      params: {
        ...onFarm(c),
        id: c.succeeds ? (await freshInvitation(c.rec.org)).id : c.rec.invitationId,
      },
    }),
  },
  // messages and reminders
  'GET /organizations/{orgId}/notifications': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c) }),
  },
  'GET /organizations/{orgId}/notifications/{id}': {
    ids: 'path',
    build: (c) => ({ params: { ...onFarm(c), id: c.rec.notificationId } }),
  },
  'GET /organizations/{orgId}/notification-preferences': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c) }),
  },
  'PUT /organizations/{orgId}/notification-preferences': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c), body: { frequency: 'weekly', weekday: 2 } }),
  },
  'PATCH /organizations/{orgId}/reminder-settings': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c), body: { digestHour: 7 } }),
  },
  'GET /organizations/{orgId}/first-run-checklist': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c) }),
  },
  'PUT /organizations/{orgId}/first-run-checklist/dismissal': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c), body: { dismissed: true } }),
  },
  'GET /unsubscribe/{token}': {
    ids: 'none',
    build: (c) => ({ params: { token: unsubscribeToken(c.w.farm.memberId) } }),
  },
  'POST /unsubscribe/{token}': {
    ids: 'none',
    build: (c) => ({ params: { token: unsubscribeToken(c.w.farm.memberId) } }),
  },
  // calendar feeds: always one of the cell's own (a new feed link of a scope ends the older one)
  'GET /calendar/{token}.ics': {
    ids: 'none',
    build: async (c) => ({
      params: { token: feedToken(await freshFeed(c.w.farm, c.w.farm.managerCookie, 'farm')) },
    }),
  },
  'GET /organizations/{orgId}/calendar-feeds': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c) }),
  },
  'POST /organizations/{orgId}/calendar-feeds': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c), body: { scope: 'personal' } }),
  },
  'POST /organizations/{orgId}/calendar-feeds · the farm feed': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c), body: { scope: 'farm' } }),
  },
  'DELETE /organizations/{orgId}/calendar-feeds/{feedId}': {
    ids: 'path',
    // the caller's own personal feed; a caller who cannot have one names the manager's
    build: async (c) => {
      const mine = c.side === 'own' && c.succeeds;
      const cookie = mine ? c.cookie! : c.rec.managerCookie;
      return { params: { ...onFarm(c), feedId: await freshFeed(c.rec, cookie, 'personal') } };
    },
  },
  'DELETE /organizations/{orgId}/calendar-feeds/{feedId} · the farm feed': {
    ids: 'path',
    build: async (c) => ({
      params: { ...onFarm(c), feedId: await freshFeed(c.rec, c.rec.managerCookie, 'farm') },
    }),
  },
};
