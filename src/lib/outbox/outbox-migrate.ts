import { putEntry, readEntries } from './outbox-db';

// Walkarounds queued by an earlier version of the app waited in localStorage; they move into the
// IndexedDB queue once, as they were (same id, same body), so an update loses none of them.
const OLD_KEY = 'hourstone.walkaround.outbox';

interface OldQueued {
  clientId: string;
  orgId: string;
  userId: string;
  machine: { fleetNumber: string };
  input: unknown;
  queuedAt: string;
  state: 'waiting' | 'refused';
  error: string | null;
}

export async function migrateStoredWalkarounds(): Promise<void> {
  let old: OldQueued[];
  try {
    old = JSON.parse(localStorage.getItem(OLD_KEY) ?? '[]') as OldQueued[];
  } catch {
    return;
  }
  if (!Array.isArray(old) || old.length === 0) return;
  const have = new Set((await readEntries()).map((e) => e.id));
  let seq = Date.now();
  for (const item of old) {
    if (have.has(item.clientId)) continue;
    await putEntry({
      id: item.clientId,
      kind: 'walkaround',
      orgId: item.orgId,
      userId: item.userId,
      label: `${item.machine.fleetNumber} walkaround`,
      body: item.input,
      photos: [],
      queuedAt: item.queuedAt,
      seq: seq++,
      state: item.state,
      error: item.error,
    });
  }
  localStorage.removeItem(OLD_KEY);
}
