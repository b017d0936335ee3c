// The due digest: per farm, at its local digest hour, each person who asked for it gets the due
// list (overdue, due soon, and what the forecast brings due in the next 14 days) per machine, at
// most DIGEST_TASK_CAP tasks of it (digest-render.ts). The rows come from dueRows(), the one due
// list; this file only selects, groups and queues.
import { Membership, Notification, NotificationPreference, Organization, User } from '../models';
import type { OrgAccess } from '../policies/access';
import { addDaysIso, todayIso } from '../../shared/domain';
import { DIGEST_HORIZON_DAYS } from '../../shared/schemas/notifications';
import { dueRows, type DueRow } from './due-list';
import { bringDuePointsCurrent } from './due-freshness';
import { queueMessage } from '../infra/mailer';
import { farmsInBatches, localClock, type ReminderFarm } from './reminders';
import { digestPeriod, effectivePreference, type EffectivePreference } from './digest-preferences';
import { unsubscribeToken } from './unsubscribe-tokens';
import { appLinks, unsubscribeHeaders } from './reminder-mail';
import {
  capDigestTasks,
  factsOnce,
  renderDigest,
  type DigestMachine,
  type DigestTask,
} from './digest-render';

export { taskFacts } from './digest-render';
export type { DigestMachine, DigestSection } from './digest-render';

/**
 * The due-list rows a digest carries: overdue, due soon, and tasks the forecast puts due within
 * DIGEST_HORIZON_DAYS of asOf (ISO date); narrowed to the person's machines and categories.
 */
export function selectDigestRows(
  rows: DueRow[],
  asOf: string,
  filter: Pick<EffectivePreference, 'machineIds' | 'categories'>,
): DigestTask[] {
  const until = addDaysIso(asOf, DIGEST_HORIZON_DAYS);
  const out: DigestTask[] = [];
  for (const row of rows) {
    if (filter.machineIds.length && !filter.machineIds.includes(row.machine.id)) continue;
    if (filter.categories.length && !filter.categories.includes(row.machine.category)) continue;
    const { status, effectiveDate } = row.due;
    if (status === 'overdue' || status === 'due_soon') out.push({ ...row, section: status });
    else if (status === 'ok' && effectiveDate !== null && effectiveDate <= until)
      out.push({ ...row, section: 'coming_up' });
  }
  return out;
}

/** Rows grouped per machine, machines in the order of their most pressing task. */
export function groupByMachine(rows: DigestTask[]): DigestMachine[] {
  const groups = new Map<string, DigestMachine>();
  for (const row of rows) {
    const group = groups.get(row.machine.id) ?? { machine: row.machine, tasks: [] };
    group.tasks.push(row);
    groups.set(row.machine.id, group);
  }
  return [...groups.values()];
}

interface Recipient {
  membershipId: string;
  role: Membership['role'];
  userId: string;
  name: string;
  email: string;
  preference: EffectivePreference;
}

async function recipientsOf(farm: ReminderFarm): Promise<Recipient[]> {
  const memberships = await Membership.findAll({
    where: { organizationId: farm.id },
    include: [{ model: User, as: 'user' }],
    order: [['id', 'ASC']],
  });
  const rows = await NotificationPreference.findAll({ where: { organizationId: farm.id } });
  const byMembership = new Map(rows.map((r) => [r.membershipId, r]));
  return memberships
    .filter((m) => m.user && m.role !== 'advisor')
    .map((m) => ({
      membershipId: m.id,
      role: m.role,
      userId: m.userId,
      name: m.user!.name,
      email: m.user!.email,
      preference: effectivePreference(m.role, byMembership.get(m.id) ?? null),
    }));
}

/** Queues the digests due at `now` for one farm; returns how many were new to the outbox. */
export async function queueFarmDigests(farm: ReminderFarm, now: Date): Promise<number> {
  const clock = localClock(farm.timeZone, now);
  if (clock.hour < farm.digestHour) return 0;
  const candidates = (await recipientsOf(farm))
    .map((r) => ({ ...r, period: digestPeriod(r.preference, clock) }))
    .filter((r): r is Recipient & { period: string } => r.period !== null);
  if (!candidates.length) return 0;
  // Hourly runs after the digest hour skip whoever has this period's digest in the outbox already
  // (the unique key would refuse it anyway; this saves building the list again).
  const already = await Notification.findAll({
    attributes: ['recipient', 'periodKey'],
    where: {
      organizationId: farm.id,
      kind: 'due_digest',
      periodKey: [...new Set(candidates.map((r) => r.period))],
    },
  });
  const done = new Set(already.map((n) => `${n.recipient}|${n.periodKey}`));
  const due = candidates.filter((r) => !done.has(`${r.email.toLowerCase()}|${r.period}`));
  if (!due.length) return 0;
  const organization = await Organization.findByPk(farm.id);
  if (!organization) return 0;
  await bringDuePointsCurrent([organization], now);
  const asOf = todayIso(organization.timeZone, now);
  // the digest's rows only, from the one due list (selectDigestRows draws the same line)
  const digestUntil = addDaysIso(asOf, DIGEST_HORIZON_DAYS);
  // Managers and technicians see the whole farm; an operator's list is their own (dueRows scopes it).
  const lists = new Map<string, DueRow[]>();
  const facts = factsOnce();
  let queued = 0;
  for (const r of due) {
    const viewKey = r.role === 'operator' ? r.userId : 'farm';
    if (!lists.has(viewKey)) {
      const access: OrgAccess = { organization, userId: r.userId, role: r.role, via: 'member' };
      const list = await dueRows(access, {}, now, { fresh: true, digestUntil });
      lists.set(viewKey, list.rows);
    }
    const tasks = selectDigestRows(lists.get(viewKey)!, asOf, r.preference);
    if (!tasks.length) continue; // nothing due: no e-mail rather than an empty one
    const capped = capDigestTasks(tasks);
    const token = unsubscribeToken(r.membershipId);
    const content = renderDigest({
      organization,
      asOf,
      frequency: r.preference.frequency === 'weekly' ? 'weekly' : 'daily',
      recipientName: r.name,
      machines: groupByMachine(capped.listed),
      capped,
      unsubscribeUrl: appLinks.unsubscribe(token),
      facts,
    });
    const row = await queueMessage({
      organizationId: farm.id,
      recipient: r.email,
      kind: 'due_digest',
      periodKey: r.period,
      ...content,
      headers: unsubscribeHeaders(token),
    });
    if (row) queued++;
  }
  return queued;
}

/**
 * Every farm whose local hour has reached its digest hour gets today's (or this week's) digests.
 * Farms are read a batch at a time and each farm's list is let go before the next one's.
 */
export async function queueDueDigests(
  now: Date,
): Promise<{ organizations: number; queued: number }> {
  let organizations = 0;
  let queued = 0;
  for await (const farms of farmsInBatches()) {
    organizations += farms.length;
    for (const farm of farms) queued += await queueFarmDigests(farm, now);
  }
  return { organizations, queued };
}
