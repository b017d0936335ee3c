// The offline outbox (src/lib/outbox): work done without a connection waits in IndexedDB and goes
// out once, oldest first, when the connection returns; one the server refuses is kept with its
// reason. Node has no IndexedDB: fake-indexeddb gives each test a fresh one, and the modules are
// imported fresh (the queue's snapshot is module state). The senders are fakes that record what
// they were given; the walkaround sender's photo step runs against a fake upload.
import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { ApiError as ApiErrorClass } from '../../src/lib/api-client';

type Outbox = typeof import('../../src/lib/outbox/outbox');
type Entry = Parameters<Outbox['enqueue']>[0];
type Sender = import('../../src/lib/outbox/outbox').OutboxSender;

let outbox: Outbox;
// The module's own ApiError (imported after resetModules, like the outbox), so instanceof holds.
let ApiError: typeof ApiErrorClass;

function memoryStorage(initial: Record<string, string> = {}) {
  const map = new Map(Object.entries(initial));
  return {
    map,
    getItem: (key: string) => map.get(key) ?? null,
    setItem: (key: string, value: string) => void map.set(key, value),
    removeItem: (key: string) => void map.delete(key),
  };
}

async function freshModules(storage = memoryStorage()) {
  vi.stubGlobal('indexedDB', new IDBFactory());
  vi.stubGlobal('localStorage', storage);
  vi.resetModules();
  outbox = await import('../../src/lib/outbox/outbox');
  ({ ApiError } = await import('../../src/lib/api-client'));
  await outbox.outboxReady();
}

beforeEach(() => freshModules());
afterEach(() => vi.unstubAllGlobals());

const entry = (id: string, userId = 'user-ann'): Entry => ({
  id,
  kind: 'walkaround',
  orgId: 'org-1',
  userId,
  label: 'T-01 walkaround',
  body: { clientId: id, machineId: 'machine-1', items: [] },
  photos: [],
});
const ids = () => outbox.outboxSnapshot().entries.map((e) => e.id);
const recording = (sent: string[], answer: (id: string) => unknown = () => ({ ok: true })) => ({
  walkaround: {
    send: async (e) => {
      sent.push(e.id);
      return answer(e.id);
    },
  } satisfies Sender,
});

describe('outbox — queueing', () => {
  it('enqueue — kept in IndexedDB as waiting, oldest first; survives a fresh start of the app', async () => {
    await outbox.enqueue(entry('a'));
    await outbox.enqueue(entry('b'));
    expect(ids()).toEqual(['a', 'b']);
    const [a] = outbox.outboxSnapshot().entries;
    expect([a.state, a.error, a.body]).toEqual(['waiting', null, entry('a').body]);
    // a reload: new modules, the same database
    const db = globalThis.indexedDB;
    vi.resetModules();
    vi.stubGlobal('indexedDB', db);
    outbox = await import('../../src/lib/outbox/outbox');
    await outbox.outboxReady();
    expect(ids()).toEqual(['a', 'b']);
  });

  it('enqueue — a photo is stored as the Blob itself', async () => {
    const blob = new Blob([new Uint8Array([1, 2, 3])], { type: 'image/png' });
    await outbox.enqueue({
      ...entry('a'),
      photos: [{ key: 'item-1', name: 'damage.png', blob, uploaded: null }],
    });
    const stored = outbox.outboxSnapshot().entries[0].photos[0];
    expect(stored.name).toBe('damage.png');
    expect(stored.blob?.size).toBe(3);
    expect(stored.blob?.type).toBe('image/png');
  });

  it('discard — removes that entry only', async () => {
    await outbox.enqueue(entry('a'));
    await outbox.enqueue(entry('b'));
    await outbox.discard('a');
    expect(ids()).toEqual(['b']);
  });

  it('an earlier version’s localStorage queue — moved in once with the same id and body, the old key removed', async () => {
    const old = [
      {
        clientId: 'old-1',
        orgId: 'org-1',
        userId: 'user-ann',
        machine: { id: 'm', fleetNumber: 'T-07', name: 'Loader' },
        input: { clientId: 'old-1', machineId: 'm' },
        queuedAt: '2026-04-07T08:00:00.000Z',
        state: 'waiting',
        error: null,
      },
    ];
    const storage = memoryStorage({ 'hourstone.walkaround.outbox': JSON.stringify(old) });
    await freshModules(storage);
    const [moved] = outbox.outboxSnapshot().entries;
    expect([moved.id, moved.kind, moved.label, moved.body]).toEqual([
      'old-1',
      'walkaround',
      'T-07 walkaround',
      old[0].input,
    ]);
    expect(storage.map.has('hourstone.walkaround.outbox')).toBe(false);
  });
});

describe('outbox — sending', () => {
  it('flushOutbox — the signed-in person’s waiting entries, oldest first; another person’s stays', async () => {
    await outbox.enqueue(entry('a'));
    await outbox.enqueue(entry('other', 'user-bob'));
    await outbox.enqueue(entry('b'));
    const sent: string[] = [];
    expect(
      await outbox.flushOutbox(
        'user-ann',
        recording(sent, (id) => ({ id })),
      ),
    ).toBe(2);
    expect(sent).toEqual(['a', 'b']);
    expect(ids()).toEqual(['other']);
    expect([...outbox.outboxSnapshot().sent.entries()]).toEqual([
      ['a', { id: 'a' }],
      ['b', { id: 'b' }],
    ]);
    expect(outbox.outboxSnapshot().sending).toBe(false);
  });

  it.each([
    ['a 503', { status: 503, code: 'unavailable', message: 'restarting' }],
    ['a 500', { status: 500, code: 'internal', message: 'bug' }],
    ['a 429', { status: 429, code: 'rate_limited', message: 'slow down' }],
    ['a 401 (session to renew)', { status: 401, code: 'unauthenticated', message: 'sign in' }],
    ['no connection', { status: 0, code: 'unreachable', message: 'offline' }],
    ['a network TypeError', null],
  ])('flushOutbox — %s on the first — stops there, both stay waiting', async (_name, init) => {
    await outbox.enqueue(entry('a'));
    await outbox.enqueue(entry('b'));
    const error = init ? new ApiError(init) : new TypeError('Failed to fetch');
    const send = vi.fn(async () => Promise.reject(error));
    expect(await outbox.flushOutbox('user-ann', { walkaround: { send } })).toBe(0);
    expect(send).toHaveBeenCalledTimes(1);
    expect(outbox.outboxSnapshot().entries.map((e) => [e.id, e.state])).toEqual([
      ['a', 'waiting'],
      ['b', 'waiting'],
    ]);
  });

  it('flushOutbox — refused (422 with field errors) — kept as refused with the reasons, the next still goes; not sent again until asked', async () => {
    await outbox.enqueue(entry('a'));
    await outbox.enqueue(entry('b'));
    const refuse = async (e: { id: string }) => {
      if (e.id === 'a')
        throw new ApiError({
          status: 409,
          code: 'tagged_out',
          message: 'T-01 is tagged out.',
          fields: { machineId: 'A technician must clear it first.' },
        });
      return { ok: true };
    };
    expect(await outbox.flushOutbox('user-ann', { walkaround: { send: refuse } })).toBe(1);
    expect(outbox.outboxSnapshot().entries.map((e) => [e.id, e.state, e.error])).toEqual([
      ['a', 'refused', 'T-01 is tagged out. A technician must clear it first.'],
    ]);
    const again = vi.fn(async () => ({ ok: true }));
    expect(await outbox.flushOutbox('user-ann', { walkaround: { send: again } })).toBe(0);
    expect(again).not.toHaveBeenCalled();
    // the person sends it again: waiting, and the next run takes it
    await outbox.sendAgain('a');
    expect(await outbox.flushOutbox('user-ann', { walkaround: { send: again } })).toBe(1);
    expect(ids()).toEqual([]);
  });

  it('flushOutbox — called twice at once — one run: each entry sent once', async () => {
    await outbox.enqueue(entry('a'));
    const sent: string[] = [];
    const senders = recording(sent);
    const runs = await Promise.all([
      outbox.flushOutbox('user-ann', senders),
      outbox.flushOutbox('user-ann', senders),
    ]);
    expect(runs).toEqual([1, 1]);
    expect(sent).toEqual(['a']);
  });

  it('flushOutbox — afterSent once per organization of the kind sent', async () => {
    await outbox.enqueue(entry('a'));
    await outbox.enqueue({ ...entry('b'), orgId: 'org-2' });
    await outbox.enqueue(entry('c'));
    const afterSent = vi.fn();
    await outbox.flushOutbox('user-ann', { walkaround: { send: async () => ({}), afterSent } });
    expect(afterSent.mock.calls).toEqual([['org-1'], ['org-2']]);
  });
});

describe('walkaround sender — photos first, each uploaded once', () => {
  it('an upload that fails for want of a connection after the first photo — the first is not uploaded again; the walkaround carries both ids', async () => {
    const uploads: string[] = [];
    let online = false;
    vi.doMock('../../src/features/walkarounds/api/upload-photo', () => ({
      uploadWalkaroundPhoto: async (_org: string, _machine: string, file: File) => {
        if (uploads.length === 1 && !online)
          throw new ApiError({ status: 0, code: 'unreachable', message: 'offline' });
        uploads.push(file.name);
        return { id: `photo-${file.name}`, thumbnailUrl: `/t/${file.name}` };
      },
    }));
    const posted: unknown[] = [];
    vi.doMock('../../src/features/walkarounds/api/submit-walkaround', () => ({
      submitWalkaround: async (_org: string, input: unknown) => (posted.push(input), { ok: 1 }),
    }));
    const { enqueueWalkaround, walkaroundSender } =
      await import('../../src/features/walkarounds/lib/queued-walkarounds');
    const input = {
      machineId: 'machine-1',
      clientId: 'w-1',
      purpose: 'use' as const,
      meterValue: 1200,
      notes: '',
      careDone: [],
      items: ['i1', 'i2', 'i3'].map((itemId) => ({
        itemId,
        result: 'fail' as const,
        note: '',
        photoId: null,
      })),
    };
    const photo = (name: string) => new File([name], name, { type: 'image/png' });
    await enqueueWalkaround({
      orgId: 'org-1',
      userId: 'user-ann',
      fleetNumber: 'T-01',
      input,
      photos: new Map([
        ['i1', photo('one.png')],
        ['i3', photo('three.png')],
      ]),
    });
    const { QueryClient } = await import('@tanstack/react-query');
    const senders = { walkaround: walkaroundSender(new QueryClient()) };
    expect(await outbox.flushOutbox('user-ann', senders)).toBe(0);
    expect(uploads).toEqual(['one.png']);
    const kept = outbox.outboxSnapshot().entries[0].photos;
    expect(kept.map((p) => [p.key, p.uploaded?.id ?? null, p.blob === null])).toEqual([
      ['i1', 'photo-one.png', true],
      ['i3', null, false],
    ]);
    online = true;
    expect(await outbox.flushOutbox('user-ann', senders)).toBe(1);
    expect(uploads).toEqual(['one.png', 'three.png']);
    expect(posted).toEqual([
      {
        ...input,
        items: [
          { itemId: 'i1', result: 'fail', note: '', photoId: 'photo-one.png' },
          { itemId: 'i2', result: 'fail', note: '', photoId: null },
          { itemId: 'i3', result: 'fail', note: '', photoId: 'photo-three.png' },
        ],
      },
    ]);
    vi.doUnmock('../../src/features/walkarounds/api/upload-photo');
    vi.doUnmock('../../src/features/walkarounds/api/submit-walkaround');
  });
});

describe('readings sender — each reading keeps its time; reasons name the machine', () => {
  it('enqueueReadings — a reading without a time gets the time it was saved; one with a time keeps it', async () => {
    const { enqueueReadings } = await import('../../src/features/readings/lib/queued-readings');
    await enqueueReadings({
      orgId: 'org-1',
      userId: 'user-ann',
      fleetNumbers: ['T-01', 'T-02'],
      input: {
        readings: [
          { machineId: 'm1', value: 1210 },
          { machineId: 'm2', value: 88, takenAt: '2026-04-07T06:00:00.000Z' },
        ],
      },
    });
    const [queued] = outbox.outboxSnapshot().entries;
    const body = queued.body as { readings: { takenAt: string }[] };
    expect(queued.label).toBe('2 readings');
    expect(Date.parse(body.readings[0].takenAt)).toBeGreaterThan(Date.now() - 60_000);
    expect(body.readings[1].takenAt).toBe('2026-04-07T06:00:00.000Z');
  });

  it('a 422 on readings.1.value — refused with the second machine’s fleet number in the reason', async () => {
    vi.doMock('../../src/features/readings/api/save-readings', () => ({
      saveReadings: async () => {
        throw new ApiError({
          status: 422,
          code: 'invalid',
          message: 'Some readings were refused.',
          fields: { 'readings.1.value': 'Lower than the last reading (90 h).' },
        });
      },
    }));
    const { enqueueReadings, readingsSender } =
      await import('../../src/features/readings/lib/queued-readings');
    await enqueueReadings({
      orgId: 'org-1',
      userId: 'user-ann',
      fleetNumbers: ['T-01', 'T-02'],
      input: {
        readings: [
          { machineId: 'm1', value: 1 },
          { machineId: 'm2', value: 2 },
        ],
      },
    });
    const { QueryClient } = await import('@tanstack/react-query');
    await outbox.flushOutbox('user-ann', { readings: readingsSender(new QueryClient()) });
    expect(outbox.outboxSnapshot().entries.map((e) => [e.state, e.error])).toEqual([
      ['refused', 'Some readings were refused. T-02: Lower than the last reading (90 h).'],
    ]);
    vi.doUnmock('../../src/features/readings/api/save-readings');
  });
});

describe('outbox id', () => {
  it('newOutboxId — without crypto.randomUUID — a v4 uuid from random bytes (all 0xff here)', async () => {
    vi.stubGlobal('crypto', { getRandomValues: (bytes: Uint8Array) => bytes.fill(0xff) });
    const { newOutboxId } = await import('../../src/lib/outbox/outbox-id');
    // RFC 9562 §5.4: version nibble 4 in byte 6, variant bits 10 in byte 8 (0x4f, 0xbf here).
    expect(newOutboxId()).toBe('ffffffff-ffff-4fff-bfff-ffffffffffff');
  });
});
