// Private iCalendar (RFC 5545) feeds: the farm's and each person's own machines. One all-day
// event per task on the date it falls due (the due list's effectiveDate, a local date of the
// farm), with the UID `${taskId}@hourstone` so a calendar app moves the event when a reading
// moves the date instead of adding a second one.
import { createHmac, randomUUID } from 'node:crypto';
import ical from 'ical-generator';
import type { Transaction } from 'sequelize';
import { sequelize } from '../db';
import { env } from '../env';
import { notFound } from '../errors';
import { CalendarFeed, Membership, NotificationPreference, Organization } from '../models';
import { authorize, type OrgAccess } from '../policies/access';
import { canHavePersonalFeed, canManageFarmFeed } from '../policies/reminders';
import { addDaysIso } from '../../shared/domain';
import type { CalendarFeedScope } from '../../shared/schemas/notifications';
import { dueList, type DueRow } from './due-list';
import { taskFacts } from './digest';
import { effectivePreference } from './digest-preferences';
import { appLinks, cautionLine } from './reminder-mail';
import { hashToken } from '../infra/tokens';

const NO_USER = '00000000-0000-0000-0000-000000000000';

/**
 * The feed's secret: its id signed with JWT_SECRET. Only the hash is stored (for the lookup), and
 * the page can show the address again to whoever may see it; revoking or a new link ends it.
 */
export const feedToken = (feedId: string) =>
  `${feedId}.${createHmac('sha256', env.JWT_SECRET).update(`calendar-feed:${feedId}`).digest('base64url')}`;

export const feedUrl = (feedId: string) =>
  `${env.APP_URL}/api/v1/calendar/${feedToken(feedId)}.ics`;

const liveFeed = (organizationId: string, userId: string | null) =>
  CalendarFeed.findOne({ where: { organizationId, userId, revokedAt: null } });

/** The caller's personal feed and, for a manager, the farm's. */
export async function feedsFor(access: OrgAccess) {
  const personal = canHavePersonalFeed(access)
    ? await liveFeed(access.organization.id, access.userId)
    : null;
  const farm = canManageFarmFeed(access) ? await liveFeed(access.organization.id, null) : null;
  return { personal, farm };
}

/** A new feed link for the scope; an earlier link of the same scope stops working. */
export async function createFeed(access: OrgAccess, scope: CalendarFeedScope) {
  if (scope === 'farm')
    authorize(canManageFarmFeed(access), 'Only a manager may share the farm calendar');
  else authorize(canHavePersonalFeed(access), 'Calendar feeds are for the people of a farm');
  const userId = scope === 'personal' ? access.userId : null;
  const id = randomUUID();
  return sequelize.transaction(async (transaction) => {
    await CalendarFeed.update(
      { revokedAt: new Date() },
      { where: { organizationId: access.organization.id, userId, revokedAt: null }, transaction },
    );
    return CalendarFeed.create(
      {
        id,
        organizationId: access.organization.id,
        userId,
        tokenHash: hashToken(feedToken(id)),
        createdBy: access.userId,
        revokedAt: null,
      },
      { transaction },
    );
  });
}

/** Revokes a live feed of this organization: one's own, or the farm's for a manager. */
export async function revokeFeed(access: OrgAccess, feedId: string): Promise<void> {
  const feed = await CalendarFeed.findOne({
    where: { id: feedId, organizationId: access.organization.id, revokedAt: null },
  });
  // Someone else's personal feed is not the caller's business: it answers as if absent.
  if (!feed || (feed.userId !== null && feed.userId !== access.userId)) throw notFound('Feed');
  if (feed.userId === null)
    authorize(canManageFarmFeed(access), 'Only a manager may revoke the farm calendar');
  await feed.update({ revokedAt: new Date() });
}

/** Revokes the personal feeds of someone leaving the organization (inside the removal). */
export async function revokePersonalFeeds(
  organizationId: string,
  userId: string,
  transaction?: Transaction,
): Promise<void> {
  await CalendarFeed.update(
    { revokedAt: new Date() },
    { where: { organizationId, userId, revokedAt: null }, transaction },
  );
}

function eventDescription(orgId: string, row: DueRow): string {
  const caution = cautionLine(row.hazards);
  return [
    `${row.machine.fleetNumber} · ${row.machine.name}`,
    `Status: ${row.due.status.replace('_', ' ')}`,
    ...taskFacts(row),
    ...(caution ? [caution] : []),
    appLinks.machine(orgId, row.machine.id),
  ].join('\n');
}

/** The feed's iCalendar text, or null when the token is unknown, revoked or its person left. */
export async function feedCalendar(token: string, now = new Date()): Promise<string | null> {
  const feed = await CalendarFeed.findOne({
    where: { tokenHash: hashToken(token), revokedAt: null },
  });
  if (!feed) return null;
  const organization = await Organization.findByPk(feed.organizationId);
  if (!organization) return null;
  let access: OrgAccess;
  let filter = { machineIds: [] as string[], categories: [] as string[] };
  if (feed.userId) {
    const membership = await Membership.findOne({
      where: { organizationId: organization.id, userId: feed.userId },
    });
    // Leaving the farm ends the feed for good: joining again later starts a new membership,
    // and a link made before it stays dead (the person makes a new one).
    if (!membership || membership.createdAt > feed.createdAt) return null;
    access = { organization, userId: feed.userId, role: membership.role, via: 'member' };
    // "My machines": what the person sees (an operator: their own), narrowed like their digest.
    filter = effectivePreference(
      membership.role,
      await NotificationPreference.findByPk(membership.id),
    );
  } else {
    access = { organization, userId: feed.createdBy ?? NO_USER, role: 'manager', via: 'member' };
  }
  const { rows } = await dueList(access, {}, now);
  const calendar = ical({
    name: feed.userId ? `${organization.name} · my machines` : `${organization.name} · service due`,
    description: 'Service tasks on the date each falls due (Hourstone forecast).',
    prodId: { company: 'Hourstone', product: 'due-calendar', language: 'EN' },
    ttl: 60 * 60,
    x: [{ key: 'X-WR-TIMEZONE', value: organization.timeZone }],
  });
  for (const row of rows) {
    const date = row.due.effectiveDate;
    if (!date) continue;
    if (filter.machineIds.length && !filter.machineIds.includes(row.machine.id)) continue;
    if (filter.categories.length && !filter.categories.includes(row.machine.category)) continue;
    calendar.createEvent({
      id: `${row.taskId}@hourstone`,
      allDay: true,
      // Local dates of the farm, written as dates: no time zone can move them to another day.
      start: new Date(`${date}T00:00:00Z`),
      end: new Date(`${addDaysIso(date, 1)}T00:00:00Z`),
      stamp: now,
      summary: `${row.machine.fleetNumber} · ${row.taskName}`,
      description: eventDescription(organization.id, row),
      url: appLinks.machine(organization.id, row.machine.id),
    });
  }
  return calendar.toString();
}
