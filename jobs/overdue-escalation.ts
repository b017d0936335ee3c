import { Membership, Organization, User } from '../server/models';
import type { OrgAccess } from '../server/policies/access';
import { dueList, type DueRow } from '../server/services/due-list';
import { queueMessage } from '../server/infra/mailer';
import { taskFacts } from '../server/services/digest';
import { farmsForReminders } from '../server/services/reminders';
import {
  appLinks,
  cautionLine,
  emailFrame,
  escapeHtml,
  SAFETY_LINE,
} from '../server/services/reminder-mail';
import { withJobLock } from './lock';

/** The outbox period of an overdue alert: the due point itself, so it is sent once per due point. */
export const overduePeriodKey = (row: Pick<DueRow, 'taskId' | 'due'>) =>
  `${row.taskId}:${row.due.dueMeter ?? ''}:${row.due.dueDate ?? ''}`;

function overdueMessage(orgId: string, farmName: string, recipientName: string, row: DueRow) {
  const title = `Overdue: ${row.machine.fleetNumber} · ${row.taskName}`;
  const link = appLinks.machine(orgId, row.machine.id);
  const facts = taskFacts(row);
  const caution = cautionLine(row.hazards);
  const intro = `Hello ${recipientName}, "${row.taskName}" on ${row.machine.fleetNumber} · ${row.machine.name} (${farmName}) is now overdue.`;
  const text = [
    intro,
    '',
    ...facts,
    ...(caution ? [caution] : []),
    '',
    `Open the machine: ${link}`,
    '',
    SAFETY_LINE,
    '',
    'You get this once for this due point; the daily due list keeps listing it until it is done.',
  ].join('\n');
  const html = emailFrame(
    title,
    `<p>${escapeHtml(intro)}</p><p>${facts.map(escapeHtml).join('<br>')}${caution ? `<br><em>${escapeHtml(caution)}</em>` : ''}</p>
<p><a href="${link}" style="color:#1d4f91;font-weight:bold;">Open the machine</a></p><p style="font-size:14px;">${escapeHtml(SAFETY_LINE)}</p>`,
    'You get this once for this due point; the daily due list keeps listing it until it is done.',
  );
  return { subject: title, text, html };
}

/**
 * One message to each manager of a farm when a task is overdue, once per due point (task, due
 * meter, due date): the next run, the next day or a second worker queue nothing new.
 */
export async function perform(now = new Date()) {
  return withJobLock('overdue-escalation', async () => {
    let queued = 0;
    for (const farm of await farmsForReminders()) {
      const managers = await Membership.findAll({
        where: { organizationId: farm.id, role: 'manager' },
        include: [{ model: User, as: 'user' }],
        order: [['id', 'ASC']],
      });
      if (!managers.length) continue;
      const organization = await Organization.findByPk(farm.id);
      if (!organization) continue;
      const access: OrgAccess = {
        organization,
        userId: managers[0].userId,
        role: 'manager',
        via: 'member',
      };
      const { rows } = await dueList(access, { status: 'overdue' }, now);
      for (const row of rows) {
        for (const manager of managers) {
          if (!manager.user) continue;
          const added = await queueMessage({
            organizationId: farm.id,
            recipient: manager.user.email,
            kind: 'overdue',
            periodKey: overduePeriodKey(row),
            ...overdueMessage(farm.id, farm.name, manager.user.name, row),
          });
          if (added) queued++;
        }
      }
    }
    return { queued };
  });
}
