// What the reminder e-mails share: links into the app, the unsubscribe headers, the safety and
// caution lines, the HTML frame and the number and date formats.
import { env } from '../env';
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
