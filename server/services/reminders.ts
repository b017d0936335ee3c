// The clock the reminder jobs run by: a farm's local date and hour, and its digest hour.
// Digest choices are in digest-preferences.ts, the unsubscribe token in unsubscribe-tokens.ts,
// the links and frame of the e-mails in reminder-mail.ts.
import { QueryTypes } from 'sequelize';
import { TZDate } from '@date-fns/tz';
import { getISOWeek, getISOWeekYear } from 'date-fns';
import { sequelize } from '../db';
import { recordAudit } from '../infra/audit';
import { dayNumberFromIso, todayIso } from '../../shared/domain';

export interface LocalClock {
  /** local ISO date (yyyy-mm-dd) */
  date: string;
  /** local hour, 0–23 */
  hour: number;
  /** local month, 1–12 */
  month: number;
  /** 1 = Monday … 7 = Sunday */
  isoWeekday: number;
  /** ISO week of the local date, e.g. 2026-W14 */
  isoWeek: string;
}

/** The wall clock of a time zone at an instant (daylight saving included). */
export function localClock(timeZone: string, now: Date): LocalClock {
  const date = todayIso(timeZone, now);
  const [y, m, d] = date.split('-').map(Number);
  // 1970-01-01 (day 0) was a Thursday, ISO weekday 4.
  const isoWeekday = ((((dayNumberFromIso(date) + 3) % 7) + 7) % 7) + 1;
  // date-fns reads a Date's local fields: build one at local midnight of the same calendar date.
  const calendarDate = new Date(y, m - 1, d);
  const week = String(getISOWeek(calendarDate)).padStart(2, '0');
  return {
    date,
    hour: new TZDate(now.getTime(), timeZone).getHours(),
    month: m,
    isoWeekday,
    isoWeek: `${getISOWeekYear(calendarDate)}-W${week}`,
  };
}

export interface ReminderFarm {
  id: string;
  name: string;
  timeZone: string;
  digestHour: number;
}

/** Every farm with its time zone and digest hour (dealers get no farm reminders). */
export async function farmsForReminders(): Promise<ReminderFarm[]> {
  return sequelize.query<ReminderFarm>(
    `SELECT id, name, time_zone AS "timeZone", digest_hour AS "digestHour"
     FROM organizations WHERE kind = 'farm' ORDER BY id`,
    { type: QueryTypes.SELECT },
  );
}

/** Every farm (as farmsForReminders), `size` at a time in id order: a run never holds them all. */
export async function* farmsInBatches(size = 100): AsyncGenerator<ReminderFarm[]> {
  let after: string | null = null;
  for (;;) {
    const batch: ReminderFarm[] = await sequelize.query<ReminderFarm>(
      `SELECT id, name, time_zone AS "timeZone", digest_hour AS "digestHour"
       FROM organizations WHERE kind = 'farm' AND (CAST(:after AS uuid) IS NULL OR id > :after)
       ORDER BY id LIMIT :size`,
      { replacements: { after, size }, type: QueryTypes.SELECT },
    );
    if (!batch.length) return;
    yield batch;
    if (batch.length < size) return;
    after = batch[batch.length - 1].id;
  }
}

export async function digestHourOf(organizationId: string): Promise<number> {
  const [row] = await sequelize.query<{ digest_hour: number }>(
    'SELECT digest_hour FROM organizations WHERE id = :organizationId',
    { replacements: { organizationId }, type: QueryTypes.SELECT },
  );
  return row?.digest_hour ?? 6;
}

/** Sets the farm's digest hour; a person's choice (actorUserId given) is audited with it. */
export async function setDigestHour(
  organizationId: string,
  digestHour: number,
  actorUserId?: string,
): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await sequelize.query(
      'UPDATE organizations SET digest_hour = :digestHour, updated_at = now() WHERE id = :organizationId',
      { replacements: { organizationId, digestHour }, transaction },
    );
    if (actorUserId === undefined) return;
    await recordAudit(
      {
        organizationId,
        actorUserId,
        action: 'organization.digest_hour',
        entityType: 'organization',
        entityId: organizationId,
        changes: { digestHour },
      },
      transaction,
    );
  });
}
