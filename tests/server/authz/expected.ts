// The authorization matrix's table of expected answers: for each documented route (the OpenAPI
// document's `METHOD /path`, plus a few named variants after " · "), what each caller gets with
// the farm's own ids. Anonymous callers get 401 on every signed-in route; a caller not listed gets
// 404 (a record it may not reach is not there). With another organization's ids (foreign), every
// caller gets 404 — or the same 403 as with own ids when its role is refused before any lookup,
// or a refusal of the field (422) when the foreign id travels in the body. See harness.ts.
//
// The rules (issue 16 and the product brief): a dealer, whatever its link, never closes, reads or
// names a farm's defects and never changes a machine's status; a `view` link reads the due list
// and machines but writes nothing; a `service` link may record and plan services and propose
// bookings; operators do walkarounds and readings on the machines they may see (their assigned
// ones where assignment exists) but do not edit schedules, machines or members; technicians record
// services and close defects; managers do all on their farm.
import { CALLERS, SIGNED_IN, type Answer, type Caller } from './callers';

export type Row = Record<Caller, Answer>;

const FARM: Caller[] = ['manager', 'technician', 'operator'];
const SHOP: Caller[] = ['manager', 'technician'];
const LINKED: Caller[] = ['viewDealer', 'serviceDealer'];
const ADVISORS: Caller[] = ['viewDealer', 'serviceDealer', 'unlinkedDealer'];

/** `ok` get 2xx, `forbidden` 403, anonymous 401, everyone else 404; `also` names exceptions. */
function row(ok: Caller[], forbidden: Caller[] = [], also: Partial<Row> = {}): Row {
  const answers = Object.fromEntries(
    CALLERS.map((c): [Caller, Answer] => [
      c,
      c === 'anonymous' ? 401 : ok.includes(c) ? '2xx' : forbidden.includes(c) ? 403 : 404,
    ]),
  ) as Row;
  return { ...answers, ...also };
}
/** A public route: the token or credentials decide, not the caller. */
const everyone = (): Row => ({ ...row([...CALLERS]), anonymous: '2xx' });
/** A route an API key reaches and no session does: every caller is refused as not signed in. */
const keyOnly = (): Row => Object.fromEntries(CALLERS.map((c) => [c, 401])) as Row;
/** Any signed-in person. */
const signedIn = (also: Partial<Row> = {}): Row => row([...SIGNED_IN], [], also);

/** The farm's readers: its people and both linked dealers. */
const read = row([...FARM, ...LINKED]);
/** The farm's people only (dealers are not routed here at all). */
const farmOnly = row(FARM);
/** Managers and technicians; operators are refused by role. */
const shop = row(SHOP, ['operator']);
/** Managers only; technicians and operators are refused by role. */
const managers = row(['manager'], ['technician', 'operator']);
/** The shop's service work, which a `service` link shares. */
const serviceWork = row([...SHOP, 'serviceDealer'], ['operator']);
/** Service history: the farm's people and a `service` link. */
const history = row([...FARM, 'serviceDealer']);
/** Dealer-side pages, addressed by each advisor to its own dealer (farm people address the farm). */
const dealerSide = row(ADVISORS);

export const EXPECTED: Record<string, Row> = {
  // accounts
  'POST /auth/sign-in': everyone(),
  'POST /auth/sign-out': everyone(),
  'POST /auth/password': signedIn(),
  'GET /me': signedIn(),
  'GET /session': everyone(),
  'POST /auth/password-reset': everyone(),
  'POST /auth/password-reset/confirm': everyone(),
  'GET /invitations/{token}': everyone(),
  'POST /invitations/{token}/accept': everyone(),
  'GET /dev/mail': everyone(),
  'GET /auth/sign-up': everyone(),
  'POST /auth/sign-up': everyone(),
  'POST /auth/verify-email': everyone(),
  'POST /account/email/confirm': everyone(),
  'GET /account': signedIn(),
  'PATCH /account': signedIn(),
  'POST /account/email': signedIn(),
  // the last manager of an organization (a dealer's last advisor) keeps the account until
  // someone else runs it: 409, naming it
  'DELETE /account': signedIn({
    manager: 409,
    viewDealer: 409,
    serviceDealer: 409,
    unlinkedDealer: 409,
    stranger: 409,
  }),
  // organizations: anyone signed in starts one; its own people read it, whoever runs it changes it
  'POST /organizations': signedIn(),
  'GET /organizations/{orgId}': farmOnly,
  'PATCH /organizations/{orgId}': managers,
  'DELETE /organizations/{orgId}': managers,
  // the farm's team
  'GET /organizations/{orgId}/members': farmOnly,
  'PATCH /organizations/{orgId}/members/{id}': managers,
  'DELETE /organizations/{orgId}/members/{id}': managers,
  'GET /organizations/{orgId}/invitations': managers,
  'POST /organizations/{orgId}/invitations': managers,
  'DELETE /organizations/{orgId}/invitations/{id}': managers,
  // machines
  'GET /organizations/{orgId}/machines': read,
  'POST /organizations/{orgId}/machines': managers,
  'GET /organizations/{orgId}/machines/{machineId}': read,
  'GET /organizations/{orgId}/machines/{machineId} · assigned to another operator': row([
    'manager',
    'technician',
    ...LINKED,
  ]),
  'PATCH /organizations/{orgId}/machines/{machineId}': managers,
  'PATCH /organizations/{orgId}/machines/{machineId} · tag out': managers,
  'POST /organizations/{orgId}/machines/{machineId}/return-to-service': shop,
  // restricted use: the farm's shop sets and lifts it; a linked dealer reaches it only to be told no
  'POST /organizations/{orgId}/machines/{machineId}/restriction': row(SHOP, [
    'operator',
    ...LINKED,
  ]),
  'POST /organizations/{orgId}/machines/{machineId}/restriction/lift': row(SHOP, [
    'operator',
    ...LINKED,
  ]),
  'PUT /organizations/{orgId}/machines/{machineId}/photo': managers,
  'GET /organizations/{orgId}/machines/{machineId}/photo': read,
  'DELETE /organizations/{orgId}/machines/{machineId}/photo': managers,
  'GET /organizations/{orgId}/machines/{machineId}/label.svg': farmOnly,
  'GET /organizations/{orgId}/fleet-import/example': managers,
  'POST /organizations/{orgId}/fleet-import/preview': managers,
  'POST /organizations/{orgId}/fleet-import/commit': managers,
  // schedules
  'GET /organizations/{orgId}/machines/{machineId}/tasks': read,
  'POST /organizations/{orgId}/machines/{machineId}/tasks': shop,
  'PATCH /organizations/{orgId}/tasks/{taskId}': shop,
  'DELETE /organizations/{orgId}/tasks/{taskId}': shop,
  'PUT /organizations/{orgId}/tasks/{taskId}/last-done': shop,
  'POST /organizations/{orgId}/tasks/{taskId}/count-from-now': shop,
  'POST /organizations/{orgId}/machines/{machineId}/count-from-now': shop,
  'GET /organizations/{orgId}/schedule-templates': farmOnly,
  'POST /organizations/{orgId}/schedule-templates': managers,
  'POST /organizations/{orgId}/machines/{machineId}/apply-template': shop,
  'POST /organizations/{orgId}/machines/{machineId}/apply-class': shop,
  // the spec sheet: read as the machine is; written by the farm's shop, never a dealer
  'GET /organizations/{orgId}/machines/{machineId}/spec-sheet': read,
  'PATCH /organizations/{orgId}/machines/{machineId}/spec-sheet': shop,
  // readings
  'GET /organizations/{orgId}/machines/{machineId}/readings': read,
  'POST /organizations/{orgId}/machines/{machineId}/readings': farmOnly,
  'POST /organizations/{orgId}/machines/{machineId}/readings · assigned to another operator':
    row(SHOP),
  'GET /organizations/{orgId}/readings/latest': read,
  'POST /organizations/{orgId}/readings/bulk': farmOnly,
  'PATCH /organizations/{orgId}/readings/{readingId}': shop,
  'DELETE /organizations/{orgId}/readings/{readingId}': shop,
  'POST /organizations/{orgId}/machines/{machineId}/meter-replacements': shop,
  // a machine's meters (issue 13): read as the machine is, changed by the farm's shop; a counter
  // reset is what the counter shows, so whoever logs readings records it
  'GET /organizations/{orgId}/machines/{machineId}/meters': read,
  'POST /organizations/{orgId}/machines/{machineId}/meters': shop,
  'PATCH /organizations/{orgId}/machines/{machineId}/meters/{meterId}': shop,
  'DELETE /organizations/{orgId}/machines/{machineId}/meters/{meterId}': shop,
  'POST /organizations/{orgId}/machines/{machineId}/meters/{meterId}/primary': shop,
  'POST /organizations/{orgId}/machines/{machineId}/meter-resets': farmOnly,
  'POST /organizations/{orgId}/readings/import/preview': shop,
  'POST /organizations/{orgId}/readings/import/commit': shop,
  'GET /organizations/{orgId}/due': read,
  'GET /organizations/{orgId}/machines/{machineId}/due': read,
  // daily care is the farm's own people's (a dealer link does not list it)
  'GET /organizations/{orgId}/daily-care': farmOnly,
  // services
  'GET /organizations/{orgId}/machines/{machineId}/service-records': history,
  'GET /organizations/{orgId}/machines/{machineId}/service-records/prefill': history,
  'POST /organizations/{orgId}/machines/{machineId}/service-records': serviceWork,
  'POST /organizations/{orgId}/machines/{machineId}/service-records · completed': serviceWork,
  'POST /organizations/{orgId}/machines/{machineId}/service-records · closing a defect': row(SHOP, [
    'operator',
    'serviceDealer',
  ]),
  'GET /organizations/{orgId}/service-records/{recordId}': history,
  'PATCH /organizations/{orgId}/service-records/{recordId}': serviceWork,
  'POST /organizations/{orgId}/service-records/{recordId}/complete': serviceWork,
  'POST /organizations/{orgId}/service-records/{recordId}/complete · closing a defect': row(SHOP, [
    'operator',
    'serviceDealer',
  ]),
  'POST /organizations/{orgId}/service-records/{recordId}/cancel': serviceWork,
  'POST /organizations/{orgId}/service-records/{recordId}/attachments': serviceWork,
  'GET /organizations/{orgId}/service-records/{recordId}/attachments/{attachmentId}': history,
  'DELETE /organizations/{orgId}/service-records/{recordId}/attachments/{attachmentId}': shop,
  'GET /organizations/{orgId}/machines/{machineId}/measurements': history,
  'GET /organizations/{orgId}/machines/{machineId}/measurements/series': history,
  'GET /organizations/{orgId}/shop-week': shop,
  'GET /organizations/{orgId}/shop-outlook': shop,
  // season hours (issue 17): the farm's people read them (operators their machines'); only a
  // manager plans a season, since the plan moves every forecast of the machine
  'GET /organizations/{orgId}/season-hours': farmOnly,
  'PUT /organizations/{orgId}/machines/{machineId}/season-plans/{year}': managers,
  'DELETE /organizations/{orgId}/machines/{machineId}/season-plans/{year}': managers,
  // walkarounds
  'GET /organizations/{orgId}/checklist-templates': farmOnly,
  'GET /organizations/{orgId}/checklist-templates/built-in/{category}': farmOnly,
  'POST /organizations/{orgId}/checklist-templates': managers,
  'GET /organizations/{orgId}/checklist-templates/{templateId}': farmOnly,
  'PATCH /organizations/{orgId}/checklist-templates/{templateId}': managers,
  'DELETE /organizations/{orgId}/checklist-templates/{templateId}': managers,
  'GET /organizations/{orgId}/machines/{machineId}/checklist': farmOnly,
  'POST /organizations/{orgId}/walkarounds': farmOnly,
  'POST /organizations/{orgId}/walkarounds · assigned to another operator': row(SHOP),
  'GET /organizations/{orgId}/walkarounds': farmOnly,
  'GET /organizations/{orgId}/walkarounds/{walkaroundId}': farmOnly,
  'POST /organizations/{orgId}/machines/{machineId}/walkaround-photos': farmOnly,
  'GET /organizations/{orgId}/walkaround-photos/{photoId}': farmOnly,
  // defects: the farm's own, never a dealer's
  'GET /organizations/{orgId}/defects': farmOnly,
  'GET /organizations/{orgId}/machines/{machineId}/defects': farmOnly,
  'POST /organizations/{orgId}/machines/{machineId}/defects': farmOnly,
  'POST /organizations/{orgId}/machines/{machineId}/defects · critical (tags out)': farmOnly,
  'GET /organizations/{orgId}/defects/{defectId}': farmOnly,
  'PATCH /organizations/{orgId}/defects/{defectId}': shop,
  'POST /organizations/{orgId}/defects/{defectId}/close': shop,
  // messages, reminders, calendars
  'GET /organizations/{orgId}/notifications': managers,
  'GET /organizations/{orgId}/notifications/{id}': managers,
  'GET /organizations/{orgId}/notification-preferences': farmOnly,
  'PUT /organizations/{orgId}/notification-preferences': farmOnly,
  'PATCH /organizations/{orgId}/reminder-settings': managers,
  // the first-run checklist of a new farm's dashboard
  'GET /organizations/{orgId}/first-run-checklist': managers,
  'PUT /organizations/{orgId}/first-run-checklist/dismissal': managers,
  'GET /unsubscribe/{token}': everyone(),
  'POST /unsubscribe/{token}': everyone(),
  'GET /calendar/{token}.ics': everyone(),
  'GET /organizations/{orgId}/calendar-feeds': farmOnly,
  'POST /organizations/{orgId}/calendar-feeds': farmOnly,
  'POST /organizations/{orgId}/calendar-feeds · the farm feed': managers,
  'DELETE /organizations/{orgId}/calendar-feeds/{feedId}': farmOnly,
  'DELETE /organizations/{orgId}/calendar-feeds/{feedId} · the farm feed': managers,
  // the farm's dealers
  'GET /organizations/{orgId}/dealers': managers,
  'POST /organizations/{orgId}/dealers': managers,
  'PATCH /organizations/{orgId}/dealers/{linkId}': managers,
  'POST /organizations/{orgId}/dealers/{linkId}/revoke': managers,
  'GET /organizations/{orgId}/audit-events': managers,
  'GET /organizations/{orgId}/export': managers,
  'GET /dealer-invitations/{token}': signedIn(),
  // accepting for a farm one does not manage is a refused field (organizationId), as for dealers
  'POST /dealer-invitations/{token}/accept': signedIn({
    technician: 422,
    operator: 422,
    viewDealer: 422,
    serviceDealer: 422,
    unlinkedDealer: 422,
  }),
  // the dealer's side
  'GET /organizations/{orgId}/customers': dealerSide,
  'POST /organizations/{orgId}/customer-invitations': dealerSide,
  'DELETE /organizations/{orgId}/customer-invitations/{linkId}': dealerSide,
  'GET /organizations/{orgId}/board': dealerSide,
  'GET /organizations/{orgId}/board.csv': dealerSide,
  'GET /organizations/{orgId}/parts-forecast': dealerSide,
  'GET /organizations/{orgId}/parts-forecast.csv': dealerSide,
  'GET /organizations/{orgId}/customer-outlook': dealerSide,
  // a customer not linked (any more) is a refused field, as the dealer-board tests have it
  'GET /organizations/{orgId}/customers/{customerId}/reminder-draft': row(LINKED, [], {
    unlinkedDealer: 422,
  }),
  'POST /organizations/{orgId}/customers/{customerId}/reminders': row(LINKED, [], {
    unlinkedDealer: 422,
  }),
  'GET /organizations/{orgId}/bookings': row([...SHOP, ...ADVISORS], ['operator']),
  // a view link writes nothing, bookings included (issue 16); an unlinked farm is a refused field
  'POST /organizations/{orgId}/bookings': row(['serviceDealer'], ['viewDealer'], {
    unlinkedDealer: 422,
  }),
  'POST /organizations/{orgId}/bookings/{bookingId}/accept': managers,
  'POST /organizations/{orgId}/bookings/{bookingId}/decline': managers,
  'POST /organizations/{orgId}/bookings/{bookingId}/cancel': dealerSide,
  // machine-data keys: the farm manager's settings (issue 13)
  'GET /organizations/{orgId}/api-keys': managers,
  'POST /organizations/{orgId}/api-keys': managers,
  'DELETE /organizations/{orgId}/api-keys/{keyId}': managers,
  // the hitch log (issue 13): read by the farm and linked dealers, hitched and unhitched by the
  // farm's people (the operator is assigned to the tractor), corrected by the shop
  'GET /organizations/{orgId}/machines/{machineId}/hitch-spans': read,
  'POST /organizations/{orgId}/hitch-spans': farmOnly,
  'POST /organizations/{orgId}/hitch-spans/{spanId}/end': farmOnly,
  'PATCH /organizations/{orgId}/hitch-spans/{spanId}': shop,
  'DELETE /organizations/{orgId}/hitch-spans/{spanId}': shop,
  // only an API key reaches these: a session, whoever holds it, is refused as not signed in
  'POST /telematics/iso15143-3': keyOnly(),
  'POST /telematics/machines/{machine}/j1939': keyOnly(),
};

/** The documented route a table key names (its variant, after " · ", left off). */
export const routeOf = (key: string) => key.split(' · ')[0];
