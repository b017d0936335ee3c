import type { MachineCategory } from '../../shared/constants';
import type { NotificationStatusName } from '../../shared/schemas/notifications';
import type { WalkaroundPurpose } from '../../shared/schemas/walkarounds';

// Every query key of the client, one factory per resource, general to specific. A resource's
// keys start [resource, orgId], so `all(orgId)` covers every list and detail of it in that
// organization, and a write invalidates the narrowest prefix that changed. The keys live here,
// not in the features, because a write in one feature makes another's reads stale (a reading
// moves the due list) and features never import each other; what each write changes is in
// `./invalidation.ts`.

/** Filters are plain JSON in the key; each feature owns their exact type. */
type Filters = object;

const machines = {
  all: (orgId: string) => ['machines', orgId] as const,
  lists: (orgId: string) => [...machines.all(orgId), 'list'] as const,
  list: (orgId: string, filters: Filters) => [...machines.lists(orgId), filters] as const,
  details: (orgId: string) => [...machines.all(orgId), 'detail'] as const,
  detail: (orgId: string, machineId: string) => [...machines.details(orgId), machineId] as const,
  /** a machine's spec sheet (capacities, filters, tyres, torques, test pressures) */
  specSheet: (orgId: string, machineId: string) =>
    [...machines.all(orgId), 'spec-sheet', machineId] as const,
};

const readings = {
  all: (orgId: string) => ['readings', orgId] as const,
  /** the last reading of every machine the caller may log (the Log hours list) */
  latest: (orgId: string) => [...readings.all(orgId), 'latest'] as const,
  /** one machine's readings and meter replacements (history and chart) */
  machine: (orgId: string, machineId: string) =>
    [...readings.all(orgId), 'machine', machineId] as const,
  /** a machine's meters, each with its last reading and its task count (issue 13) */
  meters: (orgId: string, machineId: string) =>
    [...readings.all(orgId), 'meters', machineId] as const,
};

const tasks = {
  all: (orgId: string) => ['tasks', orgId] as const,
  /** a machine's schedule with each task's due point */
  machine: (orgId: string, machineId: string) =>
    [...tasks.all(orgId), 'machine', machineId] as const,
};

const scheduleTemplates = {
  all: (orgId: string) => ['schedule-templates', orgId] as const,
  list: (orgId: string, category: string) => [...scheduleTemplates.all(orgId), category] as const,
};

const due = {
  all: (orgId: string) => ['due', orgId] as const,
  lists: (orgId: string) => [...due.all(orgId), 'list'] as const,
  list: (orgId: string, filters: Filters) => [...due.lists(orgId), filters] as const,
  /** the daily-care board: it moves with walkarounds and schedules, as the due list does */
  dailyCare: (orgId: string) => [...due.all(orgId), 'daily-care'] as const,
};

const serviceRecords = {
  all: (orgId: string) => ['service-records', orgId] as const,
  /** a machine's history: its pages and its events on the chart */
  machine: (orgId: string, machineId: string) =>
    [...serviceRecords.all(orgId), 'machine', machineId] as const,
  list: (orgId: string, machineId: string, filters: { q: string; page: number }) =>
    [...serviceRecords.machine(orgId, machineId), 'list', filters] as const,
  events: (orgId: string, machineId: string) =>
    [...serviceRecords.machine(orgId, machineId), 'events'] as const,
  /** the open defects a visit may fix, on the record form */
  allActiveDefects: (orgId: string) => [...serviceRecords.all(orgId), 'active-defects'] as const,
  activeDefects: (orgId: string, machineId: string) =>
    [...serviceRecords.allActiveDefects(orgId), machineId] as const,
  /** the record form's parts and fluids of the chosen tasks (`taskIds` sorted) */
  prefills: (orgId: string, machineId: string) =>
    [...serviceRecords.machine(orgId, machineId), 'prefill'] as const,
  prefill: (orgId: string, machineId: string, taskIds: readonly string[]) =>
    [...serviceRecords.prefills(orgId, machineId), taskIds] as const,
  details: (orgId: string) => [...serviceRecords.all(orgId), 'detail'] as const,
  detail: (orgId: string, recordId: string) =>
    [...serviceRecords.details(orgId), recordId] as const,
  shopPeople: (orgId: string) => [...serviceRecords.all(orgId), 'shop-people'] as const,
};

const measurements = {
  all: (orgId: string) => ['measurements', orgId] as const,
  machine: (orgId: string, machineId: string) => [...measurements.all(orgId), machineId] as const,
  series: (orgId: string, machineId: string, name: string) =>
    [...measurements.machine(orgId, machineId), 'series', name] as const,
};

const shopWeek = {
  all: (orgId: string) => ['shop-week', orgId] as const,
  /** `start` null: the server's current week */
  week: (orgId: string, start: string | null) =>
    [...shopWeek.all(orgId), start ?? 'current'] as const,
  /** the next weeks (issue 17): under the shop week, so what refreshes the week refreshes it */
  outlook: (orgId: string, weeks: number) => [...shopWeek.all(orgId), 'outlook', weeks] as const,
};

/** season hours (issue 17): each machine's season use by year, with its plan */
const seasonHours = {
  all: (orgId: string) => ['season-hours', orgId] as const,
  year: (orgId: string, year: number) => [...seasonHours.all(orgId), year] as const,
};

const defects = {
  all: (orgId: string) => ['defects', orgId] as const,
  lists: (orgId: string) => [...defects.all(orgId), 'list'] as const,
  list: (orgId: string, filters: Filters) => [...defects.lists(orgId), filters] as const,
  machineOptions: (orgId: string) => [...defects.all(orgId), 'machine-options'] as const,
  shopPeople: (orgId: string) => [...defects.all(orgId), 'shop-people'] as const,
  completedRecords: (orgId: string, machineId: string) =>
    [...defects.all(orgId), 'completed-records', machineId] as const,
};

const walkarounds = {
  all: (orgId: string) => ['walkarounds', orgId] as const,
  checklists: (orgId: string) => [...walkarounds.all(orgId), 'checklist'] as const,
  checklist: (orgId: string, machineId: string, purpose: WalkaroundPurpose) =>
    [...walkarounds.checklists(orgId), machineId, purpose] as const,
  /** the picker's machines, with their status */
  machines: (orgId: string) => [...walkarounds.all(orgId), 'machines'] as const,
  labelMachine: (orgId: string, machineId: string) =>
    [...walkarounds.all(orgId), 'label-machine', machineId] as const,
};

const checklistTemplates = {
  all: (orgId: string) => ['checklist-templates', orgId] as const,
  list: (orgId: string) => [...checklistTemplates.all(orgId), 'list'] as const,
  builtIn: (orgId: string, category: MachineCategory) =>
    [...checklistTemplates.all(orgId), 'built-in', category] as const,
};

const dealers = {
  all: (orgId: string) => ['dealers', orgId] as const,
  board: (orgId: string) => [...dealers.all(orgId), 'board'] as const,
  boardPage: (orgId: string, filters: Filters) => [...dealers.board(orgId), filters] as const,
  parts: (orgId: string, horizon: number, customerId: string | null) =>
    [...dealers.all(orgId), 'parts', horizon, customerId] as const,
  outlook: (orgId: string, weeks: number, customerId: string | null) =>
    [...dealers.all(orgId), 'outlook', weeks, customerId] as const,
  customers: (orgId: string) => [...dealers.all(orgId), 'customers'] as const,
  farmLinks: (orgId: string) => [...dealers.all(orgId), 'farm-links'] as const,
  reminderDraft: (orgId: string, customerId: string, taskIds: string[]) =>
    [...dealers.all(orgId), 'reminder-draft', customerId, taskIds] as const,
  bookings: (orgId: string) => [...dealers.all(orgId), 'bookings'] as const,
  activity: (orgId: string, dealerId: string | null) =>
    [...dealers.all(orgId), 'activity', dealerId] as const,
};

const messages = {
  all: (orgId: string) => ['messages', orgId] as const,
  lists: (orgId: string) => [...messages.all(orgId), 'list'] as const,
  list: (orgId: string, filters: { status?: NotificationStatusName; page: number }) =>
    [...messages.lists(orgId), filters] as const,
  detail: (orgId: string, id: string) => [...messages.all(orgId), 'detail', id] as const,
};

const reminders = {
  all: (orgId: string) => ['reminders', orgId] as const,
  preferences: (orgId: string) => [...reminders.all(orgId), 'preferences'] as const,
  feeds: (orgId: string) => [...reminders.all(orgId), 'feeds'] as const,
};

const members = {
  all: (orgId: string) => ['members', orgId] as const,
  list: (orgId: string) => [...members.all(orgId), 'list'] as const,
  /** the operators among the members, for assigning machines */
  operators: (orgId: string) => [...members.all(orgId), 'operators'] as const,
  /** the managers and technicians by name: whom an operator asks about a machine */
  contacts: (orgId: string) => [...members.all(orgId), 'contacts'] as const,
};

const invitations = {
  all: (orgId: string) => ['invitations', orgId] as const,
  list: (orgId: string) => [...invitations.all(orgId), 'list'] as const,
};

/** the organization's API keys for machine data (its manager's settings) */
/** the hitch log: which tractor pulled which implement (issue 13) */
const hitch = {
  all: (orgId: string) => ['hitch', orgId] as const,
  machine: (orgId: string, machineId: string) => [...hitch.all(orgId), machineId] as const,
};

const apiKeys = {
  all: (orgId: string) => ['api-keys', orgId] as const,
  list: (orgId: string) => [...apiKeys.all(orgId), 'list'] as const,
};

const organizations = {
  all: ['organizations'] as const,
  detail: (orgId: string) => [...organizations.all, orgId] as const,
};

const onboarding = {
  all: (orgId: string) => ['onboarding', orgId] as const,
  checklist: (orgId: string) => [...onboarding.all(orgId), 'checklist'] as const,
};

// Keys outside an organization: the session, the account and the signed-out flows.
const session = {
  all: ['session'] as const,
  me: () => [...session.all, 'me'] as const,
};

const account = {
  all: ['account'] as const,
  detail: () => [...account.all, 'detail'] as const,
};

const auth = {
  all: ['auth'] as const,
  invitation: (token: string) => [...auth.all, 'invitation', token] as const,
  signUpStatus: () => [...auth.all, 'sign-up-status'] as const,
};

/** a dealer's invitation to a farm, opened by its token before any organization is chosen */
const dealerInvitations = {
  all: ['dealer-invitations'] as const,
  detail: (token: string) => [...dealerInvitations.all, token] as const,
};

const devMail = {
  all: ['dev-mail'] as const,
  list: () => [...devMail.all, 'list'] as const,
};

export const queryKeys = {
  machines,
  readings,
  tasks,
  scheduleTemplates,
  due,
  serviceRecords,
  measurements,
  shopWeek,
  seasonHours,
  defects,
  walkarounds,
  checklistTemplates,
  dealers,
  dealerInvitations,
  messages,
  reminders,
  members,
  invitations,
  apiKeys,
  hitch,
  organizations,
  onboarding,
  session,
  account,
  auth,
  devMail,
};
