import { format, parseISO } from 'date-fns';
import { sequelize } from '../db';
import { invalid } from '../errors';
import { Membership, User } from '../models';
import type { OrgAccess } from '../policies/access';
import type { ReminderInput } from '../../shared/schemas/dealers';
import { DUE_STATUS_LABELS } from '../../shared/constants';
import { dueSpreadText, projectionSaid } from '../../shared/domain';
import { recordAudit } from '../infra/audit';
import { dealerAccessFor, recordDealerRead, requireCustomer } from './dealer-access';
import { dueList, type DueRow } from './due-list';
import { queueMessage } from '../infra/mailer';

const day = (iso: string) => format(parseISO(iso), 'd MMM yyyy');
const meter = (n: number, unit: string) =>
  `${n.toLocaleString('en-US', { maximumFractionDigits: 1 })} ${unit}`;

/** One line of the reminder for a due row, in words, from the figures the due list gave. */
function dueLine(r: DueRow): string {
  const parts: string[] = [];
  const dueMeter = r.dueOnMeter ?? r.due.dueMeter;
  if (dueMeter !== null) parts.push(`due at ${meter(dueMeter, r.machine.meterUnit)}`);
  if (r.due.dueDate) parts.push(`${dueMeter !== null ? 'or by' : 'due by'} ${day(r.due.dueDate)}`);
  // an overdue task is said overdue (its status), without a projection into a later year
  if (projectionSaid(r.due) && r.due.outcomes) parts.push(`projected ${dueSpreadText(r.due, day)}`);
  else if (projectionSaid(r.due) && r.due.projectedLow && r.due.projectedHigh)
    parts.push(
      r.due.projectedLow === r.due.projectedHigh
        ? `projected ${day(r.due.projectedLow)}`
        : `projected ${day(r.due.projectedLow)} to ${day(r.due.projectedHigh)}`,
    );
  return `- ${r.machine.fleetNumber} ${r.machine.name}: ${r.taskName} (${DUE_STATUS_LABELS[r.due.status].toLowerCase()}${parts.length ? `; ${parts.join(', ')}` : ''})`;
}

/** The customer's due rows for these tasks, in the order given; an unknown one is 422 by index. */
async function rowsFor(access: OrgAccess, customerId: string, taskIds: string[], path: string) {
  const link = await requireCustomer(access.organization.id, customerId);
  const farmAccess = dealerAccessFor(link, link.farm!, access.userId);
  const { rows } = await dueList(farmAccess, {});
  await recordDealerRead(farmAccess, { entityType: 'due', path });
  const byTask = new Map(rows.map((r) => [r.taskId, r]));
  const errors: Record<string, string> = {};
  taskIds.forEach((id, i) => {
    if (!byTask.has(id)) errors[`taskIds.${i}`] = `Not a due service of ${link.farm!.name}`;
  });
  if (Object.keys(errors).length) throw invalid(errors);
  return { farm: link.farm!, rows: [...new Set(taskIds)].map((id) => byTask.get(id)!) };
}

async function managersOf(farmId: string) {
  const rows = await Membership.findAll({
    where: { organizationId: farmId, role: 'manager' },
    include: [{ model: User, as: 'user', attributes: ['id', 'email', 'name'] }],
  });
  return rows.flatMap((m) => (m.user ? [m.user] : []));
}

/** The templated reminder (subject and text) the advisor edits before sending. */
export async function reminderDraft(
  access: OrgAccess,
  customerId: string,
  taskIds: string[],
  path: string,
) {
  const { farm, rows } = await rowsFor(access, customerId, taskIds, path);
  const advisor = await User.findByPk(access.userId, { attributes: ['name'] });
  const machines = [...new Set(rows.map((r) => r.machine.fleetNumber))];
  const subject = `Service coming due: ${machines.join(', ')} at ${farm.name}`;
  const body = [
    'Hello,',
    '',
    `Your hour-meter readings on Hourstone show ${rows.length === 1 ? 'this service' : 'these services'} coming due:`,
    '',
    ...rows.map(dueLine),
    '',
    'We would be glad to book the work in and have the parts ready. Reply to this e-mail to arrange a date that suits you.',
    '',
    advisor?.name ?? '',
    access.organization.name,
  ].join('\n');
  const recipients = (await managersOf(farm.id)).map((u) => ({ name: u.name }));
  return { customer: { id: farm.id, name: farm.name }, subject, body, recipients };
}

/**
 * Sends the reminder to each of the farm's managers through the outbox (kind
 * 'dealer_reminder'). The dialog's requestId is the message identity: a second click of the same
 * dialog queues nothing more.
 */
export async function sendReminder(
  access: OrgAccess,
  customerId: string,
  input: ReminderInput,
  path: string,
) {
  const { farm } = await rowsFor(access, customerId, input.taskIds, path);
  const advisor = await User.findByPk(access.userId, { attributes: ['name', 'email'] });
  const managers = await managersOf(farm.id);
  if (!managers.length) throw invalid({ customerId: `${farm.name} has no manager to write to` });
  // The messages and the audit entry commit together; the worker sends them.
  const queued = await sequelize.transaction(async (transaction) => {
    let count = 0;
    for (const manager of managers) {
      const row = await queueMessage(
        {
          organizationId: access.organization.id,
          recipient: manager.email,
          kind: 'dealer_reminder',
          periodKey: `reminder:${input.requestId}`,
          subject: input.subject,
          text: `${input.body}\n\n--\nSent by ${advisor?.name ?? 'a service advisor'} of ${access.organization.name} through Hourstone. Reply to this e-mail to reach them.`,
          headers: advisor ? { 'Reply-To': advisor.email } : undefined,
        },
        transaction,
      );
      if (row) count++;
    }
    if (count)
      await recordAudit(
        {
          organizationId: farm.id,
          actorUserId: access.userId,
          action: 'dealer.reminder',
          entityType: 'due',
          changes: {
            dealerOrganizationId: access.organization.id,
            taskIds: input.taskIds,
            subject: input.subject,
          },
        },
        transaction,
      );
    return count;
  });
  return { recipients: managers.length, queued, duplicate: queued === 0 };
}
