// Scenario (b): the mail server is down, then accepts TCP and never answers, then comes back.
// The worker's delivery run (jobs/deliver-mail.ts perform()) goes against each in turn, with the
// clock moved past each backoff; meanwhile the API is timed on an unrelated request (the due
// list) while anonymous password resets arrive, as they did when requests sent mail themselves.
// Needs DATABASE_URL and the SMTP timeouts in process.env before it is imported.
import { ApiSession, percentile, sleep } from './http';

const { createMailTransport, claimNextMessage, transmit, messageIdOf } =
  await import('../../server/infra/mailer');
const deliverMail = await import('../../jobs/deliver-mail');
const { queueMessage } = await import('../../server/infra/mailer');
const { sequelize } = await import('../../server/db');

export interface MailFigures {
  queued: number;
  delivered: number;
  lost: number;
  duplicated: number;
  failedForGood: number;
  downAttempts: string;
  hangAttempts: string;
  hangAttemptSeconds: number;
  dueP95NormalMs: number;
  dueP95HangMs: number;
  /** due-list requests timed: normal, during the hang */
  dueSamples: [number, number];
  resetStatuses: Record<string, number>;
  crashResentSameMessageId: boolean;
}

async function dueTimings(session: ApiSession, orgId: string, count: number, untilMs: number) {
  const times: number[] = [];
  const deadline = performance.now() + untilMs;
  for (let i = 0; i < count && performance.now() < deadline; i++) {
    const answer = await session.request('GET', `/organizations/${orgId}/due`);
    if (answer.status !== 200) throw new Error(`due list answered ${answer.status}`);
    times.push(answer.ms);
  }
  return times;
}

interface Caught {
  headers: Record<string, string>;
}

export async function mailOutage(options: {
  session: ApiSession;
  anonymous: ApiSession;
  orgId: string;
  catcherUrl: string;
  catcherSmtpUrl: string;
  deadSmtpUrl: string;
  hangingSmtpUrl: string;
  resetEmails: string[];
}): Promise<MailFigures> {
  const { session, orgId } = options;
  await fetch(`${options.catcherUrl}/messages`, { method: 'DELETE' });
  const hours = (h: number) => new Date(Date.now() + h * 3_600_000);

  // The unrelated request, before any mail trouble.
  await dueTimings(session, orgId, 5, 10_000); // warm-up
  const normal = await dueTimings(session, orgId, 100, 20_000);

  // Twenty messages waiting in the outbox.
  for (let i = 0; i < 20; i++)
    await queueMessage({
      organizationId: null,
      recipient: `check${i + 1}@reliability.example`,
      kind: 'reliability_check',
      periodKey: `reliability-${Date.now()}-${i}`,
      subject: `Reliability check ${i + 1}`,
      text: 'A message of the reliability run.',
    });

  // Down: nothing listens. Each run stops after its first refused connection.
  const down = createMailTransport(options.deadSmtpUrl);
  const downRuns = [];
  for (let h = 1; h <= 3; h++)
    downRuns.push(await deliverMail.perform(hours(h), { transport: down, limit: 3 }));
  down.close();

  // Hang: the server takes the connection and never greets. Resets arrive meanwhile, and the
  // due list is timed while the worker waits out its SMTP timeouts.
  const hang = createMailTransport(options.hangingSmtpUrl);
  const hangRuns: { retrying: number; ms: number }[] = [];
  const HANG_WINDOW_MS = 15_000;
  const hangStart = performance.now();
  const hanging = (async () => {
    for (let h = 4; performance.now() - hangStart < HANG_WINDOW_MS && h < 12; h++) {
      const t = performance.now();
      const run = await deliverMail.perform(hours(h), { transport: hang, limit: 1 });
      hangRuns.push({ retrying: run.retrying, ms: performance.now() - t });
    }
  })();
  await sleep(200);
  const resets = options.resetEmails.flatMap((email) => [email, email, email]).slice(0, 12);
  const resetAnswers = await Promise.all(
    resets.map((email) => options.anonymous.request('POST', '/auth/password-reset', { email })),
  );
  const during = await dueTimings(session, orgId, 100, HANG_WINDOW_MS - 1000);
  await hanging;
  hang.close();

  // A worker that dies between sending and recording: the claim runs out and the message goes
  // again, with the same Message-ID (at least once, never lost).
  const catcher = createMailTransport(options.catcherSmtpUrl);
  const claimed = await claimNextMessage(hours(13));
  if (claimed) await transmit(claimed, catcher); // …and the worker "crashes" here
  // Back: the worker delivers everything, each run with the clock past the backoffs.
  for (let h = 24; h < 24 * 8; h += 24) {
    const run = await deliverMail.perform(hours(h), { transport: catcher, limit: 500 });
    if (run.sent === 0 && run.retrying === 0) break;
  }
  catcher.close();

  const [rows] = (await sequelize.query(
    `SELECT id, status FROM notifications WHERE kind IN ('reliability_check', 'password_reset')`,
  )) as [{ id: string; status: string }[], unknown];
  const caught = (await (await fetch(`${options.catcherUrl}/messages`)).json()) as Caught[];
  const received = new Map<string, number>();
  for (const m of caught) {
    const id = m.headers['message-id'];
    if (id) received.set(id, (received.get(id) ?? 0) + 1);
  }
  const crashedId = claimed ? messageIdOf(claimed.id) : '';
  const expected = rows.map((r) => messageIdOf(r.id));
  const duplicated = [...received.entries()]
    .filter(([id]) => id !== crashedId)
    .reduce((n, [, times]) => n + times - 1, 0);
  const attempts = (runs: { retrying: number }[]) => runs.map((r) => r.retrying).join('+');
  return {
    queued: rows.length,
    delivered: expected.filter((id) => received.has(id)).length,
    lost: expected.filter((id) => !received.has(id)).length,
    duplicated,
    failedForGood: rows.filter((r) => r.status === 'failed').length,
    downAttempts: `${downRuns.length} runs, ${attempts(downRuns)} failed attempts`,
    hangAttempts: `${hangRuns.length} runs, ${attempts(hangRuns)} failed attempts`,
    hangAttemptSeconds: hangRuns.length ? Math.max(...hangRuns.map((r) => r.ms)) / 1000 : 0,
    dueP95NormalMs: percentile(normal, 95),
    dueP95HangMs: percentile(during, 95),
    dueSamples: [normal.length, during.length],
    resetStatuses: resetAnswers.reduce<Record<string, number>>((c, a) => {
      c[a.status] = (c[a.status] ?? 0) + 1;
      return c;
    }, {}),
    crashResentSameMessageId: !!claimed && (received.get(crashedId) ?? 0) === 2,
  };
}
