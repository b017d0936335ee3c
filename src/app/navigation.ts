import type { Role } from '../../shared/constants';
import type { IconName } from '../components/ui/icons';
import { paths } from './paths';

export interface NavItem {
  label: string;
  to: (orgId: string) => string;
  icon: IconName;
  /** active only on this exact path (the organization's home), not on pages below it */
  end?: boolean;
}

const org = paths.organization;

type ItemId =
  | 'dashboard'
  | 'walkaround'
  | 'fleet'
  | 'logHours'
  | 'defects'
  | 'shopWeek'
  | 'seasonHours'
  | 'team'
  | 'reminders'
  | 'messages'
  | 'checklists'
  | 'dealers'
  | 'parts'
  | 'customers'
  | 'bookings'
  | 'settings'
  | 'account';

// Every item of the main navigation once. The server still checks every request; this only
// decides what is offered.
const ITEMS: Record<ItemId, NavItem> = {
  dashboard: { label: 'Dashboard', to: org.dashboard.href, icon: 'gauge', end: true },
  walkaround: { label: 'Walkaround', to: org.walkaroundPick.href, icon: 'check' },
  fleet: { label: 'Fleet', to: org.machines.href, icon: 'field' },
  logHours: { label: 'Log hours', to: (orgId: string) => org.logHours.href(orgId), icon: 'clock' },
  defects: { label: 'Defects', to: (orgId: string) => org.defects.href(orgId), icon: 'alert' },
  shopWeek: {
    label: 'Shop week',
    to: (orgId: string) => org.shopWeek.href(orgId),
    icon: 'wrench',
  },
  seasonHours: {
    label: 'Season hours',
    to: (orgId: string) => org.seasonHours.href(orgId),
    icon: 'bars',
  },
  team: { label: 'Team', to: org.team.href, icon: 'team' },
  reminders: { label: 'Reminders', to: org.reminders.href, icon: 'mail' },
  messages: { label: 'Messages', to: org.messages.href, icon: 'send' },
  checklists: {
    label: 'Checklists',
    to: (orgId: string) => org.checklists.href(orgId),
    icon: 'list',
  },
  // dealer links: the farm manager's Dealers page; the advisor's parts, bookings and customers
  dealers: { label: 'Dealers', to: org.farmDealers.href, icon: 'store' },
  parts: { label: 'Parts forecast', to: org.partsForecast.href, icon: 'box' },
  bookings: { label: 'Bookings', to: org.bookings.href, icon: 'calendar' },
  customers: { label: 'Customers', to: org.customers.href, icon: 'team' },
  settings: { label: 'Settings', to: org.settings.href, icon: 'sliders' },
  account: { label: 'Account', to: org.account.href, icon: 'person' },
};

// Per role, most used first: on a phone the first four sit in the bottom bar and the rest go
// under "More" (components/layouts/main-nav.tsx), so the order decides what is one tap away.
const ORDER: Record<Role, readonly ItemId[]> = {
  operator: [
    'walkaround',
    'logHours',
    'fleet',
    'dashboard',
    'defects',
    'seasonHours',
    'reminders',
    'account',
  ],
  technician: [
    'dashboard',
    'shopWeek',
    'defects',
    'fleet',
    'logHours',
    'walkaround',
    'seasonHours',
    'bookings',
    'reminders',
    'account',
  ],
  manager: [
    'dashboard',
    'fleet',
    'logHours',
    'defects',
    'shopWeek',
    'seasonHours',
    'bookings',
    'team',
    'dealers',
    'reminders',
    'messages',
    'checklists',
    'walkaround',
    'settings',
    'account',
  ],
  advisor: ['dashboard', 'parts', 'bookings', 'customers', 'settings', 'account'],
};

/** role → the items that role sees, in order */
export const navigationByRole: Record<Role, readonly NavItem[]> = {
  manager: itemsFor('manager'),
  technician: itemsFor('technician'),
  operator: itemsFor('operator'),
  advisor: itemsFor('advisor'),
};

function itemsFor(role: Role): readonly NavItem[] {
  return ORDER[role].map((id) => ITEMS[id]);
}
