// What the reminder e-mails share: links into the app, the unsubscribe headers, the safety and
// caution lines, the HTML frame and the number and date formats.
import { env } from '../env';
import { SAFETY_DEFERRAL } from '../../shared/constants';
import { hazardCautionLines, hazardCautionText, hazardSentence } from '../../shared/domain/hazards';
import { HAZARDS } from '../../shared/schemas/schedule';
import { escapeHtml } from './accounts';

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

/**
 * A task's caution in full, in the one table's words (shared/domain/hazards.ts): "Caution. PTO
 * shaft: Stop the engine, … Follow the operator's manual, …", or null without hazards.
 */
export function cautionLine(hazards: readonly string[]): string | null {
  if (!hazards.length) return null;
  return `Caution. ${hazardCautionText(hazards)}`;
}

/** "Caution: PTO shaft and hot fluids (see Cautions below)." — a task's line in a list mail. */
export function cautionPointer(hazards: readonly string[]): string | null {
  if (!hazards.length) return null;
  return `Caution: ${hazardSentence(hazards)} (see Cautions below).`;
}

/**
 * The cautions of a list mail's tasks, each hazard once and in full (in HAZARDS order), then the deferral: a
 * heading and its lines, or none when no task has a hazard.
 */
export function cautionsSection(hazards: readonly string[]): string[] {
  // in the table's order, so the section reads the same whatever order the tasks come in
  const rank = (h: string) => {
    const i = (HAZARDS as readonly string[]).indexOf(h);
    return i === -1 ? HAZARDS.length : i;
  };
  const once = [...new Set(hazards)].sort((a, b) => rank(a) - rank(b));
  if (!once.length) return [];
  return ['Cautions', ...hazardCautionLines(once), SAFETY_DEFERRAL];
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

// Built once: a formatter costs far more to make than to use, and a digest run formats
// hundreds of thousands of figures and dates.
const numberFormat = new Intl.NumberFormat('en', { maximumFractionDigits: 1 });
const isoDateFormat = new Intl.DateTimeFormat('en', {
  weekday: 'short',
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  timeZone: 'UTC',
});

/** 1,250 — numbers in e-mails, at most one decimal. */
export const formatNumber = (n: number) => numberFormat.format(n);

/** "Mon, Apr 20, 2026" for a local ISO date (the date as written, whatever the server's zone). */
export const formatIsoDate = (iso: string) => isoDateFormat.format(new Date(`${iso}T00:00:00Z`));
