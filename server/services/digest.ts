// The due digest: per farm, at its local digest hour, each person who asked for it gets the due
// list (overdue, due soon, and what the forecast brings due in the next 14 days) per machine.
// The rows come from dueList(), the one due list; this file only selects, groups and writes.
import { Membership, Notification, NotificationPreference, Organization, User } from '../models';
import type { OrgAccess } from '../policies/access';
import {
  addDaysIso,
  dueRangeText,
  fittedMeterText,
  overText,
  remainingDaysText,
  remainingMeterText,
} from '../../shared/domain';
import { DIGEST_HORIZON_DAYS } from '../../shared/schemas/notifications';
import { dueList, type DueRow } from './due-list';
import { queueMessage } from '../infra/mailer';
import { farmsForReminders, localClock, type ReminderFarm } from './reminders';
import { digestPeriod, effectivePreference, type EffectivePreference } from './digest-preferences';
import { unsubscribeToken } from './unsubscribe-tokens';
import {
  appLinks,
  cautionPointer,
  cautionsSection,
  emailFrame,
  escapeHtml,
  formatIsoDate,
  SAFETY_LINE,
  unsubscribeHeaders,
} from './reminder-mail';

export type DigestSection = 'overdue' | 'due_soon' | 'coming_up';

export interface DigestMachine {
  machine: DueRow['machine'];
  tasks: (DueRow & { section: DigestSection })[];
}

const SECTION_LABELS: Record<DigestSection, string> = {
  overdue: 'Overdue',
  due_soon: 'Due soon',
  coming_up: 'Coming up',
};

/**
 * The due-list rows a digest carries: overdue, due soon, and tasks the forecast puts due within
 * DIGEST_HORIZON_DAYS of asOf (ISO date); narrowed to the person's machines and categories.
 */
export function selectDigestRows(
  rows: DueRow[],
  asOf: string,
  filter: Pick<EffectivePreference, 'machineIds' | 'categories'>,
): (DueRow & { section: DigestSection })[] {
  const until = addDaysIso(asOf, DIGEST_HORIZON_DAYS);
  const out: (DueRow & { section: DigestSection })[] = [];
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
export function groupByMachine(rows: (DueRow & { section: DigestSection })[]): DigestMachine[] {
  const groups = new Map<string, DigestMachine>();
  for (const row of rows) {
    const group = groups.get(row.machine.id) ?? { machine: row.machine, tasks: [] };
    group.tasks.push(row);
    groups.set(row.machine.id, group);
  }
  return [...groups.values()];
}

/**
 * The facts of one task, in the words of every screen (shared/domain/due-words.ts): due meter as
 * the meter fitted now reads it (lifetime in brackets after a replacement), calendar limit, how
 * far left or over, projection and range, and when it falls due (or how far overdue it is).
 */
export function taskFacts(row: DueRow): string[] {
  const { due } = row;
  const unit = row.machine.meterUnit;
  const facts: string[] = [];
  if (due.dueMeter !== null) {
    let meter = `Due at ${fittedMeterText(row.dueOnMeter ?? due.dueMeter, due.dueMeter, unit)}`;
    if (due.remainingMeter !== null) meter += ` — ${remainingMeterText(due.remainingMeter, unit)}`;
    facts.push(meter);
  }
  if (due.dueDate !== null) {
    let calendar = `Calendar limit ${formatIsoDate(due.dueDate)}`;
    if (due.remainingDays !== null) calendar += ` (${remainingDaysText(due.remainingDays)})`;
    facts.push(calendar);
  }
  if (due.projectedDate !== null && due.status !== 'overdue') {
    let projected = `Projected ${formatIsoDate(due.projectedDate)}`;
    const range = dueRangeText(due.projectedLow, due.projectedHigh, formatIsoDate);
    if (range && due.projectedLow !== due.projectedHigh) projected += ` (range ${range})`;
    facts.push(projected);
  }
  if (due.status === 'overdue') facts.push(`Overdue: ${overText(due, unit) ?? 'now'}`);
  else if (due.effectiveDate !== null) facts.push(`Falls due ${formatIsoDate(due.effectiveDate)}`);
  return facts;
}

export interface DigestContent {
  subject: string;
  text: string;
  html: string;
}

const machineTitle = (m: DueRow['machine']) =>
  `${m.fleetNumber} · ${m.name}${m.status === 'tagged_out' ? ' (tagged out)' : ''}`;

/** Subject, plain text and HTML of one person's digest. */
export function renderDigest(input: {
  organization: { id: string; name: string };
  asOf: string;
  frequency: 'daily' | 'weekly';
  recipientName: string;
  machines: DigestMachine[];
  unsubscribeUrl: string;
}): DigestContent {
  const { organization, machines } = input;
  const tasks = machines.flatMap((m) => m.tasks);
  const count = (s: DigestSection) => tasks.filter((t) => t.section === s).length;
  const summary = (['overdue', 'due_soon', 'coming_up'] as const)
    .filter((s) => count(s) > 0)
    .map((s) => `${count(s)} ${SECTION_LABELS[s].toLowerCase()}`)
    .join(', ');
  const title = `${input.frequency === 'weekly' ? 'Weekly due list' : 'Due list'}: ${organization.name}`;
  const subject = `${title} — ${summary}`;
  const settingsUrl = appLinks.reminders(organization.id);
  const intro = `Hello ${input.recipientName}, here is what is due on ${formatIsoDate(input.asOf)}: ${summary} (coming up = falls due within ${DIGEST_HORIZON_DAYS} days by the forecast).`;

  // each hazard of the listed tasks once, in full: the tasks point to it
  const cautions = cautionsSection(tasks.flatMap((t) => t.hazards));
  const text = [
    title,
    '',
    intro,
    '',
    ...machines.flatMap((group) => [
      machineTitle(group.machine),
      `  ${appLinks.machine(organization.id, group.machine.id)}`,
      ...group.tasks.flatMap((task) => [
        `  - ${SECTION_LABELS[task.section]}: ${task.taskName}`,
        ...taskFacts(task).map((f) => `      ${f}`),
        ...(cautionPointer(task.hazards) ? [`      ${cautionPointer(task.hazards)}`] : []),
      ]),
      '',
    ]),
    ...(cautions.length ? [...cautions, ''] : []),
    SAFETY_LINE,
    '',
    `Choose what you get and when: ${settingsUrl}`,
    `Stop these e-mails: ${input.unsubscribeUrl}`,
  ].join('\n');

  const sectionColour: Record<DigestSection, string> = {
    overdue: '#9b1c1c',
    due_soon: '#7a5200',
    coming_up: '#2f4f2f',
  };
  const body = [
    `<p style="margin:0 0 16px;">${escapeHtml(intro)}</p>`,
    ...machines.map(
      (
        group,
      ) => `<div style="margin:0 0 16px;padding:12px;background:#ffffff;border:1px solid #d9d4c5;border-radius:8px;">
<h2 style="font-size:18px;margin:0 0 4px;">${escapeHtml(machineTitle(group.machine))}</h2>
<p style="margin:0 0 8px;"><a href="${appLinks.machine(organization.id, group.machine.id)}" style="color:#1d4f91;font-weight:bold;">Open the machine</a></p>
<ul style="margin:0;padding-left:20px;">${group.tasks
        .map((task) => {
          const caution = cautionPointer(task.hazards);
          return `<li style="margin:0 0 8px;"><strong style="color:${sectionColour[task.section]};">${SECTION_LABELS[task.section]}:</strong> ${escapeHtml(task.taskName)}<br>${taskFacts(
            task,
          )
            .map(escapeHtml)
            .join(
              '<br>',
            )}${caution ? `<br><em style="color:#7a5200;">${escapeHtml(caution)}</em>` : ''}</li>`;
        })
        .join('')}</ul></div>`,
    ),
    ...(cautions.length
      ? [
          `<div style="margin:0 0 16px;padding:12px;background:#fdf6e3;border:2px solid #c99a2e;border-left-width:8px;border-radius:8px;color:#4a3500;">
<h2 style="font-size:18px;margin:0 0 8px;">${escapeHtml(cautions[0])}</h2>
${cautions
  .slice(1, -1)
  .map((line) => `<p style="margin:0 0 8px;">${escapeHtml(line)}</p>`)
  .join('\n')}
<p style="margin:0;font-weight:bold;">${escapeHtml(cautions[cautions.length - 1])}</p></div>`,
        ]
      : []),
    `<p style="margin:16px 0 0;font-size:14px;">${escapeHtml(SAFETY_LINE)}</p>`,
  ].join('\n');
  const footer = `<a href="${settingsUrl}" style="color:#1d4f91;">Choose what you get and when</a> · <a href="${input.unsubscribeUrl}" style="color:#1d4f91;">Stop these e-mails</a>`;
  return { subject, text, html: emailFrame(title, body, footer) };
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
  // Managers and technicians see the whole farm; an operator's list is their own (dueList scopes it).
  const lists = new Map<string, Awaited<ReturnType<typeof dueList>>>();
  let queued = 0;
  for (const r of due) {
    const viewKey = r.role === 'operator' ? r.userId : 'farm';
    if (!lists.has(viewKey)) {
      const access: OrgAccess = { organization, userId: r.userId, role: r.role, via: 'member' };
      // the whole list: selectDigestRows keeps overdue and due soon whatever their date
      lists.set(viewKey, await dueList(access, {}, now));
    }
    const list = lists.get(viewKey)!;
    const machines = groupByMachine(selectDigestRows(list.rows, list.asOf, r.preference));
    if (!machines.length) continue; // nothing due: no e-mail rather than an empty one
    const token = unsubscribeToken(r.membershipId);
    const content = renderDigest({
      organization,
      asOf: list.asOf,
      frequency: r.preference.frequency === 'weekly' ? 'weekly' : 'daily',
      recipientName: r.name,
      machines,
      unsubscribeUrl: appLinks.unsubscribe(token),
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

/** Every farm whose local hour has reached its digest hour gets today's (or this week's) digests. */
export async function queueDueDigests(
  now: Date,
): Promise<{ organizations: number; queued: number }> {
  const farms = await farmsForReminders();
  let queued = 0;
  for (const farm of farms) queued += await queueFarmDigests(farm, now);
  return { organizations: farms.length, queued };
}
