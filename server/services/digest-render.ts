// The words of one due digest: the facts of each task, the cap on how many tasks one e-mail
// lists, and its subject, plain text and HTML. digest.ts chooses the rows and queues the mail.
import {
  fittedMeterText,
  overText,
  remainingDaysText,
  projectionWords,
  remainingMeterText,
} from '../../shared/domain';
import { DIGEST_HORIZON_DAYS, DIGEST_TASK_CAP } from '../../shared/schemas/notifications';
import type { DueRow } from './due-list';
import {
  appLinks,
  cautionPointer,
  cautionsSection,
  emailFrame,
  escapeHtml,
  formatIsoDate,
  formatNumber,
  SAFETY_LINE,
} from './reminder-mail';

export type DigestSection = 'overdue' | 'due_soon' | 'coming_up';
export type DigestTask = DueRow & { section: DigestSection };

export interface DigestMachine {
  machine: DueRow['machine'];
  tasks: DigestTask[];
}

const SECTIONS = ['overdue', 'due_soon', 'coming_up'] as const;
const SECTION_LABELS: Record<DigestSection, string> = {
  overdue: 'Overdue',
  due_soon: 'Due soon',
  coming_up: 'Coming up',
};

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
  // an overdue task: how far over it is, not a projection running on into a later year
  const projection = projectionWords(due, unit, { date: formatIsoDate });
  if (projection) {
    facts.push(`Projected ${projection.date}${projection.spread ? ` (${projection.spread})` : ''}`);
    if (projection.beforePeak) facts.push(projection.beforePeak);
  }
  if (due.status === 'overdue') facts.push(`Overdue: ${overText(due, unit) ?? 'now'}`);
  else if (due.effectiveDate !== null) facts.push(`Falls due ${formatIsoDate(due.effectiveDate)}`);
  return facts;
}

/** taskFacts, worked out once per task for every digest of the same farm run. */
export function factsOnce(): (row: DueRow) => string[] {
  const known = new Map<string, string[]>();
  return (row) => {
    let facts = known.get(row.taskId);
    if (!facts) known.set(row.taskId, (facts = taskFacts(row)));
    return facts;
  };
}

export type SectionCounts = Record<DigestSection, number>;

const countSections = (tasks: DigestTask[]) => {
  const counts: SectionCounts = { overdue: 0, due_soon: 0, coming_up: 0 };
  for (const t of tasks) counts[t.section]++;
  return counts;
};

/**
 * The tasks one digest lists: all of them up to `cap`, else the first `cap` in the due list's
 * order (overdue first, then by the date each falls due) and the count of the rest per section.
 */
export function capDigestTasks(tasks: DigestTask[], cap = DIGEST_TASK_CAP) {
  const listed = tasks.length > cap ? tasks.slice(0, cap) : tasks;
  const more = countSections(tasks.slice(listed.length));
  return { listed, all: countSections(tasks), more, moreTotal: tasks.length - listed.length };
}

const sectionsText = (counts: SectionCounts) =>
  SECTIONS.filter((s) => counts[s] > 0)
    .map((s) => `${formatNumber(counts[s])} ${SECTION_LABELS[s].toLowerCase()}`)
    .join(', ');

export interface DigestContent {
  subject: string;
  text: string;
  html: string;
}

const machineTitle = (m: DueRow['machine']) =>
  `${m.fleetNumber} · ${m.name}${m.status === 'tagged_out' ? ' (tagged out)' : ''}`;

const SECTION_COLOUR: Record<DigestSection, string> = {
  overdue: '#9b1c1c',
  due_soon: '#7a5200',
  coming_up: '#2f4f2f',
};

/**
 * Subject, plain text and HTML of one person's digest. `machines` are the listed tasks grouped;
 * `capped` (from capDigestTasks) counts every task for the summary and says how many more there
 * are than the digest lists, with a link to the full due list.
 */
export function renderDigest(input: {
  organization: { id: string; name: string };
  asOf: string;
  frequency: 'daily' | 'weekly';
  recipientName: string;
  machines: DigestMachine[];
  capped?: Pick<ReturnType<typeof capDigestTasks>, 'all' | 'more' | 'moreTotal'>;
  unsubscribeUrl: string;
  facts?: (row: DueRow) => string[];
}): DigestContent {
  const { organization, machines } = input;
  const facts = input.facts ?? taskFacts;
  const tasks = machines.flatMap((m) => m.tasks);
  const summary = sectionsText(input.capped?.all ?? countSections(tasks));
  const title = `${input.frequency === 'weekly' ? 'Weekly due list' : 'Due list'}: ${organization.name}`;
  const subject = `${title} — ${summary}`;
  const settingsUrl = appLinks.reminders(organization.id);
  const intro = `Hello ${input.recipientName}, here is what is due on ${formatIsoDate(input.asOf)}: ${summary} (coming up = falls due within ${DIGEST_HORIZON_DAYS} days by the forecast).`;
  const dueUrl = appLinks.due(organization.id);
  const moreLine = input.capped?.moreTotal
    ? `This e-mail lists the first ${formatNumber(tasks.length)} tasks, most pressing first; ${formatNumber(input.capped.moreTotal)} more (${sectionsText(input.capped.more)}) are on the full due list: ${dueUrl}`
    : null;

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
        ...facts(task).map((f) => `      ${f}`),
        ...(cautionPointer(task.hazards) ? [`      ${cautionPointer(task.hazards)}`] : []),
      ]),
      '',
    ]),
    ...(moreLine ? [moreLine, ''] : []),
    ...(cautions.length ? [...cautions, ''] : []),
    SAFETY_LINE,
    '',
    `Choose what you get and when: ${settingsUrl}`,
    `Stop these e-mails: ${input.unsubscribeUrl}`,
  ].join('\n');

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
          return `<li style="margin:0 0 8px;"><strong style="color:${SECTION_COLOUR[task.section]};">${SECTION_LABELS[task.section]}:</strong> ${escapeHtml(task.taskName)}<br>${facts(
            task,
          )
            .map(escapeHtml)
            .join(
              '<br>',
            )}${caution ? `<br><em style="color:#7a5200;">${escapeHtml(caution)}</em>` : ''}</li>`;
        })
        .join('')}</ul></div>`,
    ),
    ...(moreLine
      ? [
          `<p style="margin:0 0 16px;font-weight:bold;">${escapeHtml(moreLine.slice(0, moreLine.lastIndexOf(': ')))}: <a href="${dueUrl}" style="color:#1d4f91;">open the due list</a></p>`,
        ]
      : []),
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
