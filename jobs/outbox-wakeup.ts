import pg from 'pg';
import { databaseTargets, env } from '../server/env';
import { logger } from '../server/logger';

/** The channel the notifications trigger (migration 0009) notifies when new messages commit. */
export const OUTBOX_CHANNEL = 'hourstone_outbox';

export type WakeReason = 'notify' | 'connected';

/** What pg_stat_activity shows for the listener's connection. */
export const LISTENER_APPLICATION_NAME = 'hourstone-outbox-listener';

export interface OutboxListener {
  /** resolves once the first LISTEN is in place */
  ready: Promise<void>;
  stop: () => Promise<void>;
}

/** Detaches a connection being given up (an error it still emits must not crash the worker). */
function forget(client: pg.Client | null) {
  client?.removeAllListeners();
  client?.on('error', () => undefined);
}

/**
 * LISTENs for new outbox rows on a connection of its own and calls `onWake` for each
 * notification (with the id of a row the committed statement inserted), and once on every
 * (re)connection to catch up with what committed meanwhile. A lost connection is retried every
 * `retryMs`. Every worker copy listens; the claims decide who sends, so a nudge to several
 * workers costs the others one empty claim each. The connection goes to DATABASE_DIRECT_URL:
 * through a transaction pooler (pgbouncer) a LISTEN would hold a server connection that is
 * handed to other clients after each statement, and the notifications would never arrive.
 */
export function listenForOutbox(
  onWake: (reason: WakeReason, notificationId?: string) => void,
  { databaseUrl = databaseTargets(env).direct, retryMs = 5000 } = {},
): OutboxListener {
  let client: pg.Client | null = null;
  let stopped = false;
  let retry: NodeJS.Timeout | undefined;
  let markReady!: () => void;
  const ready = new Promise<void>((resolve) => (markReady = resolve));

  const reconnectLater = (err?: Error) => {
    if (stopped) return;
    if (err) logger.warn({ err: err.message }, 'outbox listener lost its connection; retrying');
    const old = client;
    client = null;
    forget(old);
    old?.end().catch(() => undefined);
    clearTimeout(retry);
    retry = setTimeout(() => void connect(), retryMs);
  };

  async function connect() {
    const c = new pg.Client({
      connectionString: databaseUrl,
      application_name: LISTENER_APPLICATION_NAME,
    });
    client = c;
    c.on('notification', (n) => onWake('notify', n.payload));
    c.on('error', (err) => reconnectLater(err));
    c.on('end', () => client === c && reconnectLater(new Error('connection ended')));
    try {
      await c.connect();
      await c.query(`LISTEN ${OUTBOX_CHANNEL}`);
    } catch (err) {
      if (client === c) reconnectLater(err as Error);
      return;
    }
    markReady();
    onWake('connected');
  }

  void connect();
  return {
    ready,
    stop: async () => {
      stopped = true;
      clearTimeout(retry);
      const c = client;
      client = null;
      forget(c);
      await c?.end().catch(() => undefined);
    },
  };
}

/**
 * Wraps a job so that calls while it runs do not overlap it: they ask for one more run right
 * after (a burst of wake-ups costs at most one extra run). Resolves when the runs end.
 */
export function coalesced(run: () => Promise<unknown>): () => Promise<void> {
  let current: Promise<void> | null = null;
  let again = false;
  return () => {
    if (current) {
      again = true;
      return current;
    }
    current = (async () => {
      try {
        do {
          again = false;
          await run();
        } while (again);
      } finally {
        current = null;
      }
    })();
    return current;
  };
}
