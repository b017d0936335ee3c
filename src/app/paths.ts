// Every URL of the client, as a route pattern (`path`) and an href builder (`href`). Nothing
// else in the app writes a URL by hand.

const q = encodeURIComponent;

/**
 * The service form's options: `taskIds` to preselect; `plan`: book a plan instead of recording a
 * visit (`on`: the date to book, yyyy-mm-dd); `complete`: the id of a plan to complete
 */
export interface ServiceFormOptions {
  taskIds?: readonly string[];
  plan?: boolean;
  on?: string | null;
  complete?: string;
}

function serviceFormSearch(options: ServiceFormOptions): string {
  const search = new URLSearchParams();
  if (options.taskIds?.length) search.set('taskIds', options.taskIds.join(','));
  if (options.plan) search.set('plan', '1');
  if (options.plan && options.on) search.set('on', options.on);
  if (options.complete) search.set('complete', options.complete);
  const query = search.toString();
  return query ? `?${query}` : '';
}

export const paths = {
  home: { path: '/', href: () => '/' },
  signIn: {
    path: '/sign-in',
    href: (next?: string | null) => (next ? `/sign-in?next=${q(next)}` : '/sign-in'),
  },
  forgotPassword: { path: '/forgot-password', href: () => '/forgot-password' },
  signUp: { path: '/sign-up', href: () => '/sign-up' },
  verifyEmail: { path: '/verify-email', href: () => '/verify-email' },
  confirmEmail: { path: '/confirm-email', href: () => '/confirm-email' },
  organizationNew: { path: '/organizations/new', href: () => '/organizations/new' },
  resetPassword: {
    path: '/reset-password',
    href: (token?: string) => (token ? `/reset-password?token=${q(token)}` : '/reset-password'),
  },
  invitation: { path: '/invitations/:token', href: (token: string) => `/invitations/${q(token)}` },
  dealerInvitation: {
    path: '/dealer-invitations/:token',
    href: (token: string) => `/dealer-invitations/${q(token)}`,
  },
  organization: {
    dashboard: { path: '/o/:orgId', href: (orgId: string) => `/o/${q(orgId)}` },
    team: { path: '/o/:orgId/team', href: (orgId: string) => `/o/${q(orgId)}/team` },
    account: { path: '/o/:orgId/account', href: (orgId: string) => `/o/${q(orgId)}/account` },
    settings: {
      path: '/o/:orgId/settings',
      href: (orgId: string) => `/o/${q(orgId)}/settings`,
    },
    reminders: {
      path: '/o/:orgId/reminders',
      href: (orgId: string) => `/o/${q(orgId)}/reminders`,
    },
    messages: { path: '/o/:orgId/messages', href: (orgId: string) => `/o/${q(orgId)}/messages` },
    message: {
      path: '/o/:orgId/messages/:messageId',
      href: (orgId: string, id: string) => `/o/${q(orgId)}/messages/${q(id)}`,
    },
    logHours: {
      path: '/o/:orgId/log-hours',
      /** `find`: prefill the "Find machine" box (a stale meter's fleet number) */
      href: (orgId: string, find?: string) =>
        `/o/${q(orgId)}/log-hours${find ? `?find=${q(find)}` : ''}`,
    },
    importReadings: { path: '/o/:orgId/import', href: (orgId: string) => `/o/${q(orgId)}/import` },
    machines: { path: '/o/:orgId/machines', href: (orgId: string) => `/o/${q(orgId)}/machines` },
    machineNew: {
      path: '/o/:orgId/machines/new',
      href: (orgId: string) => `/o/${q(orgId)}/machines/new`,
    },
    importFleet: {
      path: '/o/:orgId/machines/import',
      href: (orgId: string) => `/o/${q(orgId)}/machines/import`,
    },
    machine: {
      path: '/o/:orgId/machines/:machineId',
      href: (orgId: string, machineId: string) => `/o/${q(orgId)}/machines/${q(machineId)}`,
    },
    serviceRecordNew: {
      path: '/o/:orgId/machines/:machineId/services/new',
      /**
       * `taskIds`: tasks to preselect; `plan`: book a plan instead of recording a visit (`on`: the
       * date to book, yyyy-mm-dd); `complete`: the id of a plan to complete
       */
      href: (orgId: string, machineId: string, options: ServiceFormOptions = {}) =>
        `/o/${q(orgId)}/machines/${q(machineId)}/services/new${serviceFormSearch(options)}`,
    },
    serviceRecord: {
      path: '/o/:orgId/service-records/:recordId',
      href: (orgId: string, recordId: string) => `/o/${q(orgId)}/service-records/${q(recordId)}`,
    },
    shopWeek: {
      path: '/o/:orgId/shop',
      /** `start`: the Monday of the week to show (yyyy-mm-dd); none: this week */
      href: (orgId: string, start?: string) =>
        `/o/${q(orgId)}/shop${start ? `?start=${q(start)}` : ''}`,
    },
    machineLabel: {
      path: '/o/:orgId/machines/:machineId/label',
      href: (orgId: string, machineId: string) => `/o/${q(orgId)}/machines/${q(machineId)}/label`,
    },
    walkaroundPick: {
      path: '/o/:orgId/walkaround',
      href: (orgId: string) => `/o/${q(orgId)}/walkaround`,
    },
    walkaround: {
      path: '/o/:orgId/walkaround/:machineId',
      /** `purpose` 'inspection': a shop check (technician, manager), allowed while tagged out */
      href: (orgId: string, machineId: string, purpose?: 'use' | 'inspection') =>
        `/o/${q(orgId)}/walkaround/${q(machineId)}${purpose === 'inspection' ? '?purpose=inspection' : ''}`,
    },
    defects: {
      path: '/o/:orgId/defects',
      /** `machineId`: show one machine's defects */
      href: (orgId: string, machineId?: string) =>
        `/o/${q(orgId)}/defects${machineId ? `?machineId=${q(machineId)}` : ''}`,
    },
    checklists: {
      path: '/o/:orgId/checklists',
      /** `category`: open that machine category's checklist */
      href: (orgId: string, category?: string) =>
        `/o/${q(orgId)}/checklists${category ? `?category=${q(category)}` : ''}`,
    },
    // dealer links: the dealer's board, parts, customers; the farm's dealers; both sides' bookings
    dealerBoard: {
      path: '/o/:orgId/board',
      /** `customerId`: open the board filtered to one customer */
      href: (orgId: string, customerId?: string) =>
        `/o/${q(orgId)}/board${customerId ? `?customer=${q(customerId)}` : ''}`,
    },
    // an advisor's pages of a linked customer's machine (`orgId`: the dealer, `farmId`: the farm)
    customerMachine: {
      path: '/o/:orgId/customers/:farmId/machines/:machineId',
      href: (orgId: string, farmId: string, machineId: string) =>
        `/o/${q(orgId)}/customers/${q(farmId)}/machines/${q(machineId)}`,
    },
    customerServiceRecordNew: {
      path: '/o/:orgId/customers/:farmId/machines/:machineId/services/new',
      /** the options of `serviceRecordNew` */
      href: (orgId: string, farmId: string, machineId: string, options: ServiceFormOptions = {}) =>
        `/o/${q(orgId)}/customers/${q(farmId)}/machines/${q(machineId)}/services/new${serviceFormSearch(options)}`,
    },
    customerServiceRecord: {
      path: '/o/:orgId/customers/:farmId/service-records/:recordId',
      href: (orgId: string, farmId: string, recordId: string) =>
        `/o/${q(orgId)}/customers/${q(farmId)}/service-records/${q(recordId)}`,
    },
    partsForecast: { path: '/o/:orgId/parts', href: (orgId: string) => `/o/${q(orgId)}/parts` },
    seasonHours: {
      path: '/o/:orgId/season-hours',
      /** `year`: the season to show; none: this year */
      href: (orgId: string, year?: number) =>
        `/o/${q(orgId)}/season-hours${year ? `?year=${year}` : ''}`,
    },
    customers: { path: '/o/:orgId/customers', href: (orgId: string) => `/o/${q(orgId)}/customers` },
    bookings: { path: '/o/:orgId/bookings', href: (orgId: string) => `/o/${q(orgId)}/bookings` },
    farmDealers: { path: '/o/:orgId/dealers', href: (orgId: string) => `/o/${q(orgId)}/dealers` },
  },
  devMail: {
    path: '/dev/mail',
    href: () => '/dev/mail',
    message: { path: '/dev/mail/:messageId', href: (id: string) => `/dev/mail/${q(id)}` },
  },
} as const;

/**
 * The `next` parameter after sign-in, only when it is a path inside this app: an absolute or
 * protocol-relative URL there would turn the sign-in page into an open redirect.
 */
export function safeNextPath(next: string | null | undefined): string | null {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\'))
    return null;
  if (next.startsWith(paths.signIn.path)) return null;
  return next;
}

/**
 * Where a signed-in person starts: an operator at the daily walkaround (their job in the yard),
 * everyone else at the organization's dashboard; the start page without an organization.
 */
export const homeHref = (orgId: string | null, role?: string) =>
  !orgId
    ? paths.home.href()
    : role === 'operator'
      ? paths.organization.walkaroundPick.href(orgId)
      : paths.organization.dashboard.href(orgId);
