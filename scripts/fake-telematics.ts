// A local fake telematics feed for the demo (issue 13): every few seconds it posts an ISO/TS
// 15143-3 fleet snapshot for the demo farm's newer machines (Larkspur's T-02 and S-01, model
// years 2019 and later with an hour meter, per SCENARIO.md) with an API key, as a telematics
// provider would. Their hours rise from their last reading as a working engine's do (a little
// under one hour per hour), sampled once a minute, so a new reading arrives each minute and the
// posts in between are resends that add nothing. `npm start` runs it beside the mail catcher.
//
//   FAKE_TELEMATICS_KEY=hs_…      post with this key (else one is made for the demo's manager,
//                                 and earlier keys of the fake feed are revoked)
//   FAKE_TELEMATICS_URL=…         the API (default http://127.0.0.1:$PORT/api/v1)
//   FAKE_TELEMATICS_SECONDS=5     seconds between posts
export {};

const { sequelize } = await import('../server/db');
const { Machine, Organization } = await import('../server/models');
const { ApiKey } = await import('../server/models/api-key');
const { createApiKey, revokeApiKey } = await import('../server/services/api-keys');
const { demoOrgId, demoStaff } = await import('../server/seeders/demo-ids');
const { Op } = await import('sequelize');

const KEY_NAME = 'Demo telematics feed';
const apiUrl =
  process.env.FAKE_TELEMATICS_URL ?? `http://127.0.0.1:${process.env.PORT ?? 4310}/api/v1`;
const everyMs = Math.max(1, Number(process.env.FAKE_TELEMATICS_SECONDS ?? 5)) * 1000;
// engine hours per hour of the clock: a tractor and a sprayer at work, idling now and then
const PACE: Record<string, number> = { 'T-02': 0.9, 'S-01': 0.8 };

const farm = await Organization.findByPk(demoOrgId('larkspur'));
if (!farm) {
  console.log('fake telematics: no demo farm in this database; nothing to send');
  await sequelize.close();
  process.exit(0);
}
const machines = await Machine.findAll({
  where: {
    organizationId: farm.id,
    fleetNumber: { [Op.in]: Object.keys(PACE) },
    status: { [Op.ne]: 'sold' },
    meterUnit: 'h',
  },
  order: [['fleetNumber', 'ASC']],
});

/** The machine's last reading at or before now: where its feed starts. */
async function lastReading(machineId: string) {
  const [row] = await sequelize.query<{ value: string; taken_at: Date }>(
    `SELECT value, taken_at FROM meter_readings WHERE machine_id = :machineId AND taken_at <= now()
     ORDER BY taken_at DESC, lifetime_value DESC LIMIT 1`,
    { replacements: { machineId }, type: 'SELECT' as never },
  );
  return row ? { value: Number(row.value), atMs: new Date(row.taken_at).getTime() } : null;
}

async function feedKey(): Promise<string> {
  if (process.env.FAKE_TELEMATICS_KEY) return process.env.FAKE_TELEMATICS_KEY;
  const [managerId] = demoStaff('larkspur', 'manager');
  const access = {
    organization: farm!,
    userId: managerId,
    role: 'manager' as const,
    via: 'member' as const,
  };
  // the secret of an earlier run is gone with it: retire those keys (each revocation audited)
  const earlier = await ApiKey.findAll({
    where: { organizationId: farm!.id, name: KEY_NAME, revokedAt: null },
  });
  for (const key of earlier) await revokeApiKey(access, key.id);
  const { secret } = await createApiKey(access, { name: KEY_NAME, scopes: ['readings:write'] });
  return secret;
}

const starts = new Map<string, { value: number; atMs: number }>();
for (const m of machines)
  starts.set(m.id, (await lastReading(m.id)) ?? { value: 0, atMs: Date.now() });
const key = await feedKey();
await sequelize.close();
console.log(
  `fake telematics: posting ${machines.map((m) => m.fleetNumber).join(', ')} of ${farm.name} every ${everyMs / 1000} s with the key "${KEY_NAME}"`,
);

/** The snapshot as of the current minute: hours grown from each machine's last reading. */
function snapshot(nowMs: number) {
  const minute = Math.floor(nowMs / 60_000) * 60_000;
  return {
    Fleet: {
      version: '1',
      snapshotTime: new Date(nowMs).toISOString(),
      Links: [],
      Equipment: machines.map((m) => {
        const start = starts.get(m.id)!;
        // never before the last reading: until the clock passes it, the feed resends that one
        const at = Math.max(minute, start.atMs);
        const since = Math.max(0, at - Math.max(start.atMs, feedStartedMs));
        const hours = start.value + (since / 3_600_000) * PACE[m.fleetNumber];
        return {
          EquipmentHeader: {
            OEMName: m.make,
            Model: m.model,
            SerialNumber: m.serialNumber,
            ...(m.telematicsId && { EquipmentID: m.telematicsId }),
          },
          CumulativeOperatingHours: {
            datetime: new Date(at).toISOString(),
            Hour: Math.round(hours * 100) / 100,
          },
        };
      }),
    },
  };
}

const feedStartedMs = Date.now();
let stopped = false;
for (const signal of ['SIGINT', 'SIGTERM'] as const) process.on(signal, () => (stopped = true));

async function postOnce() {
  try {
    const res = await fetch(`${apiUrl}/telematics/iso15143-3`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', authorization: `Bearer ${key}` },
      body: JSON.stringify(snapshot(Date.now())),
    });
    const body = (await res.json()) as {
      data?: { items: { fleetNumber: string | null; status: string; reason: string | null }[] };
      error?: { message: string };
    };
    if (!res.ok) return console.log(`fake telematics: ${res.status} ${body.error?.message ?? ''}`);
    for (const item of body.data!.items) {
      if (item.status === 'recorded') console.log(`fake telematics: ${item.fleetNumber} reported`);
      else if (item.status !== 'already_there')
        console.log(`fake telematics: ${item.fleetNumber ?? '?'} ${item.status}: ${item.reason}`);
    }
  } catch (error) {
    console.log(`fake telematics: the API did not answer (${(error as Error).message})`);
  }
}

while (!stopped) {
  await postOnce();
  await new Promise((resolve) => setTimeout(resolve, everyMs));
}
