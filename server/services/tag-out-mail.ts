// The e-mail that tells a farm's shop at once that a machine was tagged out. It is queued in the
// outbox inside the transaction that tags the machine out, so it exists exactly when the tag-out
// does; the period key is the tag-out's audit event, so one event is never mailed twice.
import type { Transaction } from 'sequelize';
import { Membership, User, type Machine, type Organization } from '../models';
import { queueMessage } from '../infra/mailer';
import { appLinks, emailFrame, escapeHtml, SAFETY_LINE } from './reminder-mail';

export const TAG_OUT_MAIL_KIND = 'tag_out';
const SHOP_ROLES = ['manager', 'technician'] as const;

export interface TagOutEvent {
  /** the audit event of the tag-out: one e-mail per person per event */
  eventId: string;
  at: Date;
  /** in the farm's words: "Walkaround: Brakes: fail", "Reported: Steering play" */
  reason: string;
  actorUserId: string | null;
}

/** One formatter per time zone, kept: building one costs more than the mail it formats. */
const timeFormats = new Map<string, Intl.DateTimeFormat>();
function localTime(at: Date, timeZone: string) {
  let format = timeFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-GB', {
      dateStyle: 'medium',
      timeStyle: 'short',
      timeZone,
    });
    timeFormats.set(timeZone, format);
  }
  return format.format(at);
}

/** The farm's managers and technicians (e-mail, name), never operators or dealers. */
async function shopPeople(organizationId: string, transaction: Transaction) {
  const rows = await Membership.findAll({
    where: { organizationId, role: [...SHOP_ROLES] },
    include: [{ model: User, as: 'user', attributes: ['email', 'name'] }],
    transaction,
  });
  return rows.flatMap((m) => (m.user ? [{ email: m.user.email, name: m.user.name }] : []));
}

/** Queues "T-01 is tagged out" to each manager and technician of the farm; returns how many. */
export async function queueTagOutMail(
  farm: Organization,
  machine: Machine,
  event: TagOutEvent,
  transaction: Transaction,
): Promise<number> {
  const people = await shopPeople(farm.id, transaction);
  if (!people.length) return 0;
  const actor = event.actorUserId
    ? await User.findByPk(event.actorUserId, { attributes: ['name'], transaction })
    : null;
  const when = localTime(event.at, farm.timeZone);
  const label = `${machine.fleetNumber} ${machine.name}`;
  const link = appLinks.machine(farm.id, machine.id);
  const facts = [
    `${label} was tagged out on ${when}${actor ? ` by ${actor.name}` : ''}.`,
    `Why: ${event.reason}`,
  ];
  const release =
    'Nobody may use it until the defect is repaired and a technician or manager returns it to service with a note of what was checked.';
  const subject = `${machine.fleetNumber} is tagged out: do not use it`;
  let queued = 0;
  for (const person of people) {
    const row = await queueMessage(
      {
        organizationId: farm.id,
        recipient: person.email,
        kind: TAG_OUT_MAIL_KIND,
        periodKey: event.eventId,
        subject,
        text: [
          `Hello ${person.name},`,
          '',
          ...facts,
          '',
          release,
          '',
          `The machine: ${link}`,
          '',
          SAFETY_LINE,
        ].join('\n'),
        html: emailFrame(
          subject,
          [
            `<p>Hello ${escapeHtml(person.name)},</p>`,
            ...facts.map((f) => `<p>${escapeHtml(f)}</p>`),
            `<p><strong>${escapeHtml(release)}</strong></p>`,
            `<p><a href="${escapeHtml(link)}">Open ${escapeHtml(machine.fleetNumber)}</a></p>`,
          ].join('\n'),
          escapeHtml(SAFETY_LINE),
        ),
      },
      transaction,
    );
    if (row) queued += 1;
  }
  return queued;
}
