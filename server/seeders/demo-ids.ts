// The demo's stable ids (the same on every load, so links and bookmarks survive a reload) and
// lookups of its invented organizations and people.
import { createHash } from 'node:crypto';
import { DEMO_ORGANIZATIONS, DEMO_PEOPLE, type DemoOrganization } from './demo-people';

/** A stable id from a name, so the demo's records keep their ids (and links) across reloads. */
export function demoId(name: string): string {
  const h = createHash('sha256').update(`hourstone-demo:${name}`).digest('hex');
  const variant = ((parseInt(h[16], 16) & 0x3) | 0x8).toString(16);
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-8${h.slice(13, 16)}-${variant}${h.slice(17, 20)}-${h.slice(20, 32)}`;
}

export const demoOrgId = (key: DemoOrganization['key']) => demoId(`org/${key}`);
export const demoUserId = (email: string) => demoId(`user/${email}`);
export const demoMachineId = (m: { organization: string; fleetNumber: string }) =>
  demoId(`machine/${m.organization}/${m.fleetNumber}`);
export const demoOrganization = (key: DemoOrganization['key']) =>
  DEMO_ORGANIZATIONS.find((o) => o.key === key)!;

/** The user ids of an organization's people with this role, in the order of DEMO_PEOPLE. */
export const demoStaff = (key: DemoOrganization['key'], role: string) =>
  DEMO_PEOPLE.filter((p) => p.organization === key && p.role === role).map((p) =>
    demoUserId(p.email),
  );
