import { ROLES, type Role } from '../../shared/constants';
import type { IconName } from '../components/ui/icons';
import { paths } from './paths';

export interface NavItem {
  label: string;
  to: (orgId: string) => string;
  icon: IconName;
  /** active only on this exact path (the organization's home), not on pages below it */
  end?: boolean;
}

interface NavEntry extends NavItem {
  roles: readonly Role[];
}

const everyone = ROLES;
const org = paths.organization;

// The whole main navigation, in display order: one line per item, with the roles that see it.
// The server still checks every request; this only decides what is offered.
const NAV_ENTRIES: readonly NavEntry[] = [
  { label: 'Dashboard', to: org.dashboard.href, icon: 'gauge', roles: everyone, end: true },
  {
    label: 'Fleet',
    to: org.machines.href,
    icon: 'field',
    roles: ['manager', 'technician', 'operator'],
  },
  {
    label: 'Log hours',
    to: (orgId: string) => org.logHours.href(orgId),
    icon: 'clock',
    roles: ['manager', 'technician', 'operator'],
  },
  { label: 'Team', to: org.team.href, icon: 'team', roles: ['manager'] },
  {
    label: 'Reminders',
    to: org.reminders.href,
    icon: 'mail',
    roles: ['manager', 'technician', 'operator'],
  },
  { label: 'Messages', to: org.messages.href, icon: 'external', roles: ['manager'] },
  { label: 'Account', to: org.account.href, icon: 'person', roles: everyone },
];

/** role → the items that role sees, in order */
export const navigationByRole: Record<Role, readonly NavItem[]> = {
  manager: itemsFor('manager'),
  technician: itemsFor('technician'),
  operator: itemsFor('operator'),
  advisor: itemsFor('advisor'),
};

function itemsFor(role: Role): readonly NavItem[] {
  return NAV_ENTRIES.filter((entry) => entry.roles.includes(role));
}
