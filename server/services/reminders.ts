// What the reminder jobs share: a farm's local clock and digest hour, each member's digest
// preferences, the signed one-click unsubscribe token, and the links and frame of the e-mails.
import { createHmac, timingSafeEqual } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { TZDate } from '@date-fns/tz';
import { getISOWeek, getISOWeekYear } from 'date-fns';
import { sequelize } from '../db';
import { env } from '../env';
import { invalid, notFound } from '../errors';
import { Machine, Membership, NotificationPreference, Organization } from '../models';
import type { OrgAccess } from '../policies/access';
import { recordAudit } from '../infra/audit';
import type { Role } from '../../shared/constants';
import { dayNumberFromIso, todayIso } from '../../shared/domain';
import type {
  DigestFrequency,
  NotificationPreferenceInput,
} from '../../shared/schemas/notifications';
import { escapeHtml } from './accounts';

// ---- the farm's clock ------------------------------------------------------------------------

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

// ---- preferences ------------------------------------------------------------------------------

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

// ---- one-click unsubscribe (RFC 8058) -----------------------------------------------------

const UNSUBSCRIBE_KIND = 'due_digest';

function signature(membershipId: string): string {
  return createHmac('sha256', env.JWT_SECRET)
    .update(`unsubscribe:${membershipId}:${UNSUBSCRIBE_KIND}`)
    .digest('base64url');
}

/** A token naming the membership, signed with JWT_SECRET so it cannot be forged for another. */
export function unsubscribeToken(membershipId: string): string {
  return `${membershipId}.${signature(membershipId)}`;
}

/** The membership id of a genuine token, else null. */
export function verifyUnsubscribeToken(token: string): string | null {
  const [membershipId, given, extra] = token.split('.');
  if (!membershipId || !given || extra !== undefined) return null;
  const expected = Buffer.from(signature(membershipId));
  const actual = Buffer.from(given);
  if (expected.length !== actual.length || !timingSafeEqual(expected, actual)) return null;
  return membershipId;
}

/** Turns the person's digest off; null when the token is not genuine or the membership is gone. */
export async function unsubscribe(token: string): Promise<{ organizationName: string } | null> {
  const membershipId = verifyUnsubscribeToken(token);
  if (!membershipId) return null;
  const membership = await Membership.findByPk(membershipId, {
    include: [{ model: Organization, as: 'organization' }],
  });
  if (!membership?.organization) return null;
  const existing = await NotificationPreference.findByPk(membershipId);
  if (existing) await existing.update({ frequency: 'off' });
  else
    await NotificationPreference.create({
      membershipId,
      organizationId: membership.organizationId,
      frequency: 'off',
    });
  return { organizationName: membership.organization.name };
}

// ---- links and the e-mail frame ------------------------------------------------------------

export const appLinks = {
  machine: (orgId: string, machineId: string) => `${env.APP_URL}/o/${orgId}/machines/${machineId}`,
  logHours: (orgId: string) => `${env.APP_URL}/o/${orgId}/log-hours`,
  reminders: (orgId: string) => `${env.APP_URL}/o/${orgId}/reminders`,
  due: (orgId: string) => `${env.APP_URL}/o/${orgId}`,
  unsubscribe: (token: string) => `${env.APP_URL}/api/v1/unsubscribe/${token}`,
};

/** RFC 8058 headers: mail apps show an "unsubscribe" button that POSTs to the link. */
export const unsubscribeHeaders = (token: string) => ({
  'List-Unsubscribe': `<${appLinks.unsubscribe(token)}>`,
  'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click',
});

export const SAFETY_LINE =
  "Before any service: stop the engine, disengage the PTO, lower or block raised implements and relieve hydraulic pressure. Follow the operator's manual, local regulations and qualified service practice.";

const HAZARD_WORDS: Record<string, string> = {
  pto: 'PTO shaft',
  hydraulic_pressure: 'stored hydraulic pressure',
  raised_load: 'raised implement or load',
  stored_energy: 'stored energy (springs, snap rings)',
  hot_fluid: 'hot fluids',
  battery: 'battery',
};

/** "Caution: PTO shaft, hot fluids — see the operator's manual." or null without hazards. */
export function cautionLine(hazards: readonly string[]): string | null {
  if (!hazards.length) return null;
  const names = hazards.map((h) => HAZARD_WORDS[h] ?? h.replace(/_/g, ' '));
  return `Caution: ${names.join(', ')} — see the operator's manual.`;
}

export { escapeHtml };

/**
 * A single-column HTML e-mail that reads on a phone: no tables for layout, inline styles only
 * (mail apps drop style sheets), body text at 16 px.
 */
export function emailFrame(title: string, body: string, footer: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>${escapeHtml(title)}</title></head>
<body style="margin:0;padding:0;background:#f6f4ee;">
<div style="max-width:600px;margin:0 auto;padding:16px;font-family:Arial,Helvetica,sans-serif;font-size:16px;line-height:1.45;color:#1f2a1f;">
<h1 style="font-size:22px;margin:0 0 12px;">${escapeHtml(title)}</h1>
${body}
<div style="margin-top:24px;padding-top:12px;border-top:1px solid #d9d4c5;font-size:14px;color:#4a544a;">${footer}</div>
</div></body></html>`;
}

/** 1,250 — numbers in e-mails, at most one decimal. */
export const formatNumber = (n: number) =>
  new Intl.NumberFormat('en', { maximumFractionDigits: 1 }).format(n);

/** "Mon, Apr 20, 2026" for a local ISO date (the date as written, whatever the server's zone). */
export const formatIsoDate = (iso: string) =>
  new Intl.DateTimeFormat('en', {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    timeZone: 'UTC',
  }).format(new Date(`${iso}T00:00:00Z`));
