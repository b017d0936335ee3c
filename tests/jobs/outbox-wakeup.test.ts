import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { resetDatabase } from '../support/db';
import { caughtMail, clearMail, setMailAccepting } from '../support/mail';
import * as deliverMail from '../../jobs/deliver-mail';
import {
  coalesced,
  LISTENER_APPLICATION_NAME,
  listenForOutbox,
  type OutboxListener,
  type WakeReason,
} from '../../jobs/outbox-wakeup';
import { sequelize } from '../../server/db';
import { queueMessage, type OutgoingMessage } from '../../server/infra/mailer';

const message = (periodKey: string): OutgoingMessage => ({
  organizationId: null,
  recipient: 'wake@test.example',
  kind: 'test',
  periodKey,
  subject: `Wake ${periodKey}`,
  text: 'Hello',
});

/** Collects the listener's wake-ups; `next(reason)` resolves with the next one of that reason. */
function wakeLog() {
  const seen: { reason: WakeReason; id?: string }[] = [];
  let waiters: { reason: WakeReason; resolve: (id?: string) => void }[] = [];
  const onWake = (reason: WakeReason, id?: string) => {
    seen.push({ reason, id });
    const ready = waiters.filter((w) => w.reason === reason);
    waiters = waiters.filter((w) => w.reason !== reason);
    for (const w of ready) w.resolve(id);
  };
  const next = (reason: WakeReason) =>
    new Promise<string | undefined>((resolve) => waiters.push({ reason, resolve }));
  return { seen, onWake, next };
}

describe('outbox wake-up — NOTIFY on commit, LISTEN in the worker', () => {
  let listener: OutboxListener | null = null;
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
    await setMailAccepting(true);
  });
  afterEach(async () => {
    await listener?.stop();
    listener = null;
  });

  it('wake-up — only a committed insert wakes the workers (not a rolled-back one, not a duplicate that inserts nothing), with its id', async () => {
    const log = wakeLog();
    const connected = log.next('connected');
    listener = listenForOutbox(log.onWake);
    await listener.ready;
    await connected;
    const firstWake = log.next('notify');
    await queueMessage(message('first'));
    await firstWake;
    await sequelize
      .transaction(async (transaction) => {
        await queueMessage(message('rolled-back'), transaction);
        throw new Error('the request failed');
      })
      .catch(() => undefined);
    expect(await queueMessage(message('first'))).toBeNull(); // a duplicate: nothing inserted
    const committed = log.next('notify');
    const row = await sequelize.transaction((transaction) =>
      queueMessage(message('committed'), transaction),
    );
    // notifications arrive in commit order: anything the earlier statements sent came first
    expect(await committed).toBe(row!.id);
    expect(log.seen.filter((w) => w.reason === 'notify')).toHaveLength(2);
  });

  it('wake-up — a new message is delivered without waiting for the schedule (listener + delivery run)', async () => {
    let delivered!: () => void;
    const sent = new Promise<void>((resolve) => (delivered = resolve));
    const deliver = coalesced(async () => {
      if ((await deliverMail.perform()).sent > 0) delivered();
    });
    const log = wakeLog();
    const connected = log.next('connected');
    listener = listenForOutbox((reason, id) => {
      log.onWake(reason, id);
      void deliver();
    });
    await connected;
    await queueMessage(message('prompt'));
    await sent;
    expect((await caughtMail()).map((m) => m.subject)).toContain('Wake prompt');
  });

  it('wake-up — a dropped LISTEN connection is opened again and catches up', async () => {
    const log = wakeLog();
    const first = log.next('connected');
    listener = listenForOutbox(log.onWake, { retryMs: 20 });
    await first;
    const again = log.next('connected');
    await sequelize.query(
      `SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE application_name = :name`,
      { replacements: { name: LISTENER_APPLICATION_NAME }, type: QueryTypes.SELECT },
    );
    await again;
    const woke = log.next('notify');
    const row = await queueMessage(message('after reconnect'));
    expect(await woke).toBe(row!.id);
  });
});

describe('coalesced runs', () => {
  it('coalesced — calls during a run ask for one more run, not one each; never two at once', async () => {
    let runs = 0;
    let active = 0;
    let most = 0;
    const gates: (() => void)[] = [];
    const run = coalesced(async () => {
      runs++;
      active++;
      most = Math.max(most, active);
      await new Promise<void>((resolve) => gates.push(resolve));
      active--;
    });
    const first = run();
    void run();
    void run();
    void run();
    expect(runs).toBe(1);
    gates.shift()!(); // the first run ends; the asked-for one starts
    await new Promise((resolve) => setImmediate(resolve));
    expect(runs).toBe(2);
    gates.shift()!();
    await first;
    expect(runs).toBe(2);
    expect(most).toBe(1);
  });
});
