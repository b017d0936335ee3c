// Each member's due-digest choices: the saved row, or the role's default.
import { invalid, notFound } from '../errors';
import { Machine, Membership, NotificationPreference } from '../models';
import type { OrgAccess } from '../policies/access';
import type { Role } from '../../shared/constants';
import type {
  DigestFrequency,
  NotificationPreferenceInput,
} from '../../shared/schemas/notifications';
import type { LocalClock } from './reminders';

/** Roles that get the daily digest until they choose otherwise. */
export const DIGEST_DEFAULT_ROLES: readonly Role[] = ['manager', 'technician'];

export interface EffectivePreference {
  frequency: DigestFrequency;
  weekday: number;
  machineIds: string[];
  categories: string[];
  /** true while the person has not chosen (the role's default applies) */
  isDefault: boolean;
}

/** A member's digest choices: their saved row, or daily for managers and technicians, else off. */
export function effectivePreference(
  role: Role,
  row: NotificationPreference | null,
): EffectivePreference {
  if (row) {
    return {
      frequency: row.frequency,
      weekday: row.weekday,
      machineIds: row.machineIds,
      categories: row.categories,
      isDefault: false,
    };
  }
  return {
    frequency: DIGEST_DEFAULT_ROLES.includes(role) ? 'daily' : 'off',
    weekday: 1,
    machineIds: [],
    categories: [],
    isDefault: true,
  };
}

/**
 * The outbox period of this person's digest at this local time, or null when none is due now:
 * daily → the local date; weekly → the ISO week, on the chosen weekday only.
 */
export function digestPeriod(
  preference: Pick<EffectivePreference, 'frequency' | 'weekday'>,
  clock: LocalClock,
): string | null {
  if (preference.frequency === 'daily') return `daily:${clock.date}`;
  if (preference.frequency === 'weekly' && preference.weekday === clock.isoWeekday)
    return `weekly:${clock.isoWeek}`;
  return null;
}

async function membershipOf(access: OrgAccess) {
  const membership = await Membership.findOne({
    where: { organizationId: access.organization.id, userId: access.userId },
  });
  if (!membership) throw notFound('Membership');
  return membership;
}

/** The caller's own digest choices in this organization. */
export async function ownPreference(access: OrgAccess): Promise<EffectivePreference> {
  const membership = await membershipOf(access);
  const row = await NotificationPreference.findByPk(membership.id);
  return effectivePreference(membership.role, row);
}

/** Saves the caller's digest choices; machines must belong to this farm (else 422, nothing saved). */
export async function saveOwnPreference(
  access: OrgAccess,
  input: NotificationPreferenceInput,
): Promise<EffectivePreference> {
  const membership = await membershipOf(access);
  const machineIds = [...new Set(input.machineIds)];
  if (machineIds.length) {
    const found = await Machine.count({
      where: { organizationId: access.organization.id, id: machineIds },
    });
    if (found !== machineIds.length)
      throw invalid({ machineIds: 'Choose machines of this farm only' });
  }
  await NotificationPreference.upsert({
    membershipId: membership.id,
    organizationId: access.organization.id,
    frequency: input.frequency,
    weekday: input.weekday,
    machineIds,
    categories: [...new Set(input.categories)],
  });
  return effectivePreference(membership.role, await NotificationPreference.findByPk(membership.id));
}
