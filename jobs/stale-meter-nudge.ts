import { QueryTypes } from 'sequelize';
import { sequelize } from '../server/db';
import { queueMessage } from '../server/infra/mailer';
import { farmsForReminders, localClock, type ReminderFarm } from '../server/services/reminders';
import {
  appLinks,
  emailFrame,
  escapeHtml,
  formatIsoDate,
  formatNumber,
} from '../server/services/reminder-mail';
import { todayIso } from '../shared/domain';
import { localDaysSince, staleCutoff } from '../server/services/stale-meters';
import { PRIMARY_FORECAST_JOIN } from '../server/services/primary-forecast';
import { loadJobSchedule } from './schedule';
import { withJobLock } from './lock';

interface StaleAssignment {
  user_id: string;
  email: string;
  user_name: string;
  machine_id: string;
  fleet_number: string;
  machine_name: string;
  meter_unit: string;
  last_value: number | null;
  last_taken_at: Date | null;
  since: Date;
}

/**
 * People assigned to a machine that is in service and in season (or has no season set) with no
 * reading for `days` of the farm's calendar days (counted from the machine's creation when it
 * never had one).
 */
async function staleAssignments(farm: ReminderFarm, month: number, cutoff: Date) {
  return sequelize.query<StaleAssignment>(
    `SELECT mo.user_id, u.email, u.name AS user_name, m.id AS machine_id, m.fleet_number,
        m.name AS machine_name, m.meter_unit, f.last_value, f.last_taken_at,
        coalesce(f.last_taken_at, m.created_at) AS since
     FROM machine_operators mo
     JOIN memberships ms ON ms.organization_id = mo.organization_id AND ms.user_id = mo.user_id
     JOIN users u ON u.id = mo.user_id
     JOIN machines m ON m.id = mo.machine_id AND m.organization_id = mo.organization_id
     ${PRIMARY_FORECAST_JOIN}
     WHERE mo.organization_id = :org AND m.status = 'in_service'
       AND (cardinality(m.season_months) = 0 OR :month = ANY(m.season_months))
       AND coalesce(f.last_taken_at, m.created_at) < :cutoff
     ORDER BY u.id, m.fleet_number`,
    { replacements: { org: farm.id, month, cutoff }, type: QueryTypes.SELECT },
  );
}

function nudgeMessage(farm: ReminderFarm, a: StaleAssignment, daysSince: number) {
  const machine = `${a.fleet_number} · ${a.machine_name}`;
  const link = appLinks.logHours(farm.id);
  const last =
    a.last_taken_at && a.last_value !== null
      ? `The last reading was ${formatNumber(a.last_value)} ${a.meter_unit} on ${formatIsoDate(todayIso(farm.timeZone, new Date(a.last_taken_at)))}.`
      : 'No reading has been logged for it yet.';
  const intro = `Hello ${a.user_name}, ${machine} has had no hour-meter reading for ${daysSince} days. ${last} A fresh reading keeps its service dates right.`;
  const subject = `Log the hours of ${machine}`;
  return {
    subject,
    text: [intro, '', `Log hours: ${link}`, '', farm.name].join('\n'),
    html: emailFrame(
      subject,
      `<p>${escapeHtml(intro)}</p><p><a href="${link}" style="display:inline-block;padding:12px 18px;background:#2f4f2f;color:#ffffff;border-radius:8px;font-weight:bold;text-decoration:none;">Log hours</a></p>`,
      escapeHtml(farm.name),
    ),
  };
}

/**
 * Nudges the people assigned to stale machines, at or after the farm's digest hour. One message
 * per person and machine for each `days` days without a reading (the period names the last
 * reading), so a new reading ends the nudges and no run sends one twice.
 */
export async function perform(now = new Date(), days = loadJobSchedule().STALE_NUDGE_DAYS) {
  return withJobLock('stale-meter-nudge', async () => {
    let queued = 0;
    for (const farm of await farmsForReminders()) {
      const clock = localClock(farm.timeZone, now);
      if (clock.hour < farm.digestHour) continue;
      const cutoff = staleCutoff(farm.timeZone, now, days);
      for (const a of await staleAssignments(farm, clock.month, cutoff)) {
        const since = new Date(a.since);
        const daysSince = localDaysSince(since, farm.timeZone, now);
        const round = Math.floor(daysSince / days);
        const added = await queueMessage({
          organizationId: farm.id,
          recipient: a.email,
          kind: 'stale_nudge',
          periodKey: `${a.machine_id}:${since.toISOString()}:${round}`,
          ...nudgeMessage(farm, a, daysSince),
        });
        if (added) queued++;
      }
    }
    return { queued };
  });
}
