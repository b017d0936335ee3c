// The walkaround offline queue (src/features/walkarounds/lib/outbox.ts, storage.ts): walkarounds
// finished without a connection wait in localStorage and go out once when it returns. Node has
// no localStorage or window: the test gives the module a small in-memory store and an
// EventTarget as the window, then imports it fresh for each test (its queue state is module
// state).
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { ApiError as ApiErrorClass } from '../../src/lib/api-client';

type Outbox = typeof import('../../src/features/walkarounds/lib/outbox');
type Queued = Parameters<Outbox['enqueueWalkaround']>[0];
type Send = Parameters<Outbox['flushOutbox']>[1];
type Outcome = Awaited<ReturnType<Send>>;

const KEY = 'hourstone.walkaround.outbox';

/** A Storage that keeps strings in a Map; `full` makes every write fail as a full disk does. */
function memoryStorage() {
  const map = new Map<string, string>();
  return {
    map,
    full: false,
    getItem: (key: string) => map.get(key) ?? null,
    setItem(key: string, value: string) {
      if (this.full) throw new DOMException('quota exceeded', 'QuotaExceededError');
      map.set(key, value);
    },
    removeItem: (key: string) => void map.delete(key),
  };
}

let storage: ReturnType<typeof memoryStorage>;
let outbox: Outbox;
// The module's own ApiError (imported after resetModules, like the outbox), so instanceof holds.
let ApiError: typeof ApiErrorClass;

beforeEach(async () => {
  storage = memoryStorage();
  vi.stubGlobal('localStorage', storage);
  vi.stubGlobal('window', new EventTarget());
  vi.resetModules();
  outbox = await import('../../src/features/walkarounds/lib/outbox');
  ({ ApiError } = await import('../../src/lib/api-client'));
});

afterEach(() => {
  vi.unstubAllGlobals();
});

const item = (clientId: string, userId = 'user-ann'): Queued => ({
  clientId,
  orgId: 'org-1',
  userId,
  machine: { id: 'machine-1', fleetNumber: 'T-01', name: 'North tractor' },
  input: {
    machineId: 'machine-1',
    clientId,
    purpose: 'use',
    meterValue: 1200,
    notes: '',
    items: [],
    careDone: [],
  },
  queuedAt: '2026-04-07T08:00:00.000Z',
});
const stored = () => JSON.parse(storage.map.get(KEY) ?? '[]') as { clientId: string }[];
const outcome = (duplicate: boolean) => ({ duplicate }) as Outcome;

describe('walkaround outbox — queueing', () => {
  it('enqueueWalkaround — stores the walkaround as waiting under the outbox key', () => {
    expect(outbox.OUTBOX_KEY).toBe(KEY);
    expect(outbox.enqueueWalkaround(item('a'))).toBe(true);
    expect(JSON.parse(storage.map.get(KEY)!)).toEqual([
      { ...item('a'), state: 'waiting', error: null },
    ]);
    expect(outbox.outboxSnapshot().items.map((i) => i.clientId)).toEqual(['a']);
  });

  it('enqueueWalkaround — the same clientId twice — one entry, the later one', () => {
    outbox.enqueueWalkaround(item('a'));
    outbox.enqueueWalkaround({ ...item('a'), queuedAt: '2026-04-07T09:00:00.000Z' });
    expect(outbox.outboxSnapshot().items).toEqual([
      { ...item('a'), queuedAt: '2026-04-07T09:00:00.000Z', state: 'waiting', error: null },
    ]);
  });

  it('enqueueWalkaround — storage full — answers false, yet shows the walkaround for now', () => {
    storage.full = true;
    expect(outbox.enqueueWalkaround(item('a'))).toBe(false);
    expect(storage.map.has(KEY)).toBe(false);
    expect(outbox.outboxSnapshot().items.map((i) => i.clientId)).toEqual(['a']);
  });

  it('discardQueued — removes that walkaround only', () => {
    outbox.enqueueWalkaround(item('a'));
    outbox.enqueueWalkaround(item('b'));
    outbox.discardQueued('a');
    expect(stored().map((i) => i.clientId)).toEqual(['b']);
  });

  it('subscribeOutbox — told of a change here and of one made in another tab', () => {
    const listener = vi.fn();
    const unsubscribe = outbox.subscribeOutbox(listener);
    outbox.enqueueWalkaround(item('a'));
    expect(listener).toHaveBeenCalledTimes(1);
    // Another tab queued 'z': its storage event shows the stored queue here.
    storage.map.set(KEY, JSON.stringify([{ ...item('z'), state: 'waiting', error: null }]));
    window.dispatchEvent(Object.assign(new Event('storage'), { key: KEY }));
    expect(listener).toHaveBeenCalledTimes(2);
    expect(outbox.outboxSnapshot().items.map((i) => i.clientId)).toEqual(['z']);
    // Another key, or after unsubscribing: nothing.
    window.dispatchEvent(Object.assign(new Event('storage'), { key: 'something.else' }));
    unsubscribe();
    window.dispatchEvent(Object.assign(new Event('storage'), { key: KEY }));
    expect(listener).toHaveBeenCalledTimes(2);
  });
});

describe('walkaround outbox — sending', () => {
  it('flushOutbox — sends the signed-in person’s waiting walkarounds oldest first; 2 sent', async () => {
    outbox.enqueueWalkaround(item('a'));
    outbox.enqueueWalkaround(item('other', 'user-bob'));
    outbox.enqueueWalkaround(item('b'));
    const sent: string[] = [];
    const send: Send = async (_orgId, input) => {
      sent.push(input.clientId);
      return outcome(input.clientId === 'b');
    };
    expect(await outbox.flushOutbox('user-ann', send)).toBe(2);
    expect(sent).toEqual(['a', 'b']);
    // Bob's stays for Bob's session; the answers are kept by clientId.
    expect(stored().map((i) => i.clientId)).toEqual(['other']);
    const snapshot = outbox.outboxSnapshot();
    expect([...snapshot.sent.entries()]).toEqual([
      ['a', outcome(false)],
      ['b', outcome(true)],
    ]);
    expect(snapshot.sending).toBe(false);
  });

  it('flushOutbox — no connection on the first — stops, both stay waiting; 0 sent', async () => {
    outbox.enqueueWalkaround(item('a'));
    outbox.enqueueWalkaround(item('b'));
    const send = vi.fn<Send>(async () => {
      throw new ApiError({ status: 0, code: 'unreachable', message: 'offline' });
    });
    expect(await outbox.flushOutbox('user-ann', send)).toBe(0);
    expect(send).toHaveBeenCalledTimes(1);
    expect(outbox.outboxSnapshot().items.map((i) => [i.clientId, i.state])).toEqual([
      ['a', 'waiting'],
      ['b', 'waiting'],
    ]);
  });

  it.each([
    ['a 503', { status: 503, code: 'unavailable', message: 'restarting' }],
    ['a 500', { status: 500, code: 'internal', message: 'bug' }],
    ['a 429', { status: 429, code: 'rate_limited', message: 'slow down' }],
    ['a 401 (session to renew)', { status: 401, code: 'unauthenticated', message: 'sign in' }],
    ['no connection', { status: 0, code: 'unreachable', message: 'offline' }],
    ['a network TypeError', null],
  ])('flushOutbox — %s — worth trying later: stays waiting', async (_name, init) => {
    const error = init ? new ApiError(init) : new TypeError('Failed to fetch');
    outbox.enqueueWalkaround(item('a'));
    expect(await outbox.flushOutbox('user-ann', async () => Promise.reject(error))).toBe(0);
    expect(outbox.outboxSnapshot().items).toEqual([
      { ...item('a'), state: 'waiting', error: null },
    ]);
  });

  it('flushOutbox — refused (409, no field errors) — the message alone', async () => {
    outbox.enqueueWalkaround(item('a'));
    const conflict = new ApiError({ status: 409, code: 'conflict', message: 'Machine is sold.' });
    expect(await outbox.flushOutbox('user-ann', async () => Promise.reject(conflict))).toBe(0);
    expect(outbox.outboxSnapshot().items.map((i) => [i.state, i.error])).toEqual([
      ['refused', 'Machine is sold.'],
    ]);
  });

  it('flushOutbox — refused (422 with field errors) — marked refused with the reasons, the next still goes', async () => {
    outbox.enqueueWalkaround(item('a'));
    outbox.enqueueWalkaround(item('b'));
    const send: Send = async (_orgId, input) => {
      if (input.clientId === 'a')
        throw new ApiError({
          status: 422,
          code: 'invalid',
          message: 'The walkaround was refused.',
          fields: { meterValue: 'Hour meter is below the last reading.' },
        });
      return outcome(false);
    };
    expect(await outbox.flushOutbox('user-ann', send)).toBe(1);
    expect(outbox.outboxSnapshot().items).toEqual([
      {
        ...item('a'),
        state: 'refused',
        error: 'The walkaround was refused. Hour meter is below the last reading.',
      },
    ]);
    // A refused one is not sent again.
    const again = vi.fn<Send>();
    expect(await outbox.flushOutbox('user-ann', again)).toBe(0);
    expect(again).not.toHaveBeenCalled();
  });

  it('flushOutbox — called twice at once — one run: each walkaround sent once', async () => {
    outbox.enqueueWalkaround(item('a'));
    const send = vi.fn<Send>(async () => outcome(false));
    const [first, second] = await Promise.all([
      outbox.flushOutbox('user-ann', send),
      outbox.flushOutbox('user-ann', send),
    ]);
    expect([first, second]).toEqual([1, 1]);
    expect(send).toHaveBeenCalledTimes(1);
  });
});

describe('walkaround storage — never throws', () => {
  it('readJson — text that is not JSON — null', async () => {
    const { readJson } = await import('../../src/features/walkarounds/lib/storage');
    storage.map.set('k', '{not json');
    expect(readJson('k')).toBeNull();
    expect(readJson('missing')).toBeNull();
  });

  it('newClientId — without crypto.randomUUID — a v4 uuid from random bytes (all 0xff here)', async () => {
    vi.stubGlobal('crypto', { getRandomValues: (bytes: Uint8Array) => bytes.fill(0xff) });
    const { newClientId } = await import('../../src/features/walkarounds/lib/storage');
    // Byte 6 → (0xff & 0x0f) | 0x40 = 0x4f (version 4); byte 8 → (0xff & 0x3f) | 0x80 = 0xbf.
    expect(newClientId()).toBe('ffffffff-ffff-4fff-bfff-ffffffffffff');
  });
});
