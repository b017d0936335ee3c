// The invented demo organizations and people (see the project's SCENARIO notes). Every demo
// account shares one public password, which is why production refuses the demo unless asked.
import type { OrganizationKind, Role, UnitSystem } from '../../shared/constants';

export const DEMO_PASSWORD = 'hourstone-demo';

export interface DemoOrganization {
  key: 'larkspur' | 'osier' | 'quillon';
  name: string;
  kind: OrganizationKind;
  timeZone: string;
  units: UnitSystem;
}

export const DEMO_ORGANIZATIONS: DemoOrganization[] = [
  {
    key: 'larkspur',
    name: 'Larkspur Flats Farm',
    kind: 'farm',
    timeZone: 'America/Chicago',
    units: 'imperial',
  },
  {
    key: 'osier',
    name: 'Osier Creek Dairy',
    kind: 'farm',
    timeZone: 'Europe/Dublin',
    units: 'metric',
  },
  {
    key: 'quillon',
    name: 'Quillon Equipment & Service',
    kind: 'dealer',
    timeZone: 'America/Chicago',
    units: 'imperial',
  },
];

export interface DemoPerson {
  name: string;
  email: string;
  organization: DemoOrganization['key'];
  role: Role;
}

export const DEMO_PEOPLE: DemoPerson[] = [
  {
    name: 'Marta Quist',
    email: 'marta@larkspur.example',
    organization: 'larkspur',
    role: 'manager',
  },
  {
    name: 'Dev Okafor',
    email: 'dev@larkspur.example',
    organization: 'larkspur',
    role: 'technician',
  },
  {
    name: 'Lena Haugen',
    email: 'lena@larkspur.example',
    organization: 'larkspur',
    role: 'operator',
  },
  { name: 'Sam Birch', email: 'sam@larkspur.example', organization: 'larkspur', role: 'operator' },
  {
    name: 'Aoife Brennan',
    email: 'aoife@osiercreek.example',
    organization: 'osier',
    role: 'manager',
  },
  { name: 'Ravi Calder', email: 'ravi@quillon.example', organization: 'quillon', role: 'advisor' },
];
