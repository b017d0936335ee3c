// The demo's meters beside the primary ones with their readings, and the hitch log with the
// readings it gives its implements: built from the generated histories (demo-meters.ts,
// demo-hitch.ts), then written as plain rows consistent with migrations 0026 and 0028.
import type { Transaction } from 'sequelize';
import { MachineMeter } from '../models';
import { HitchSpan } from '../models/hitch-span';
import { METER_KIND_UNITS } from '../../shared/constants';
import type { DemoReading, MachineReadings } from './demo-readings';
import { DEMO_MACHINES } from './demo-fleet';
import {
  coveredShare,
  DEMO_HITCHES,
  hitchReadings,
  planSpans,
  type DemoHitch,
  type DemoSpan,
} from './demo-hitch';
import { DEMO_EXTRA_METERS, demoMeterName, deriveMeterReadings } from './demo-meters';
import {
  demoId,
  demoMachineId as machineId,
  demoOrganization as orgOf,
  demoOrgId as orgId,
  demoUserId as userId,
} from './demo-ids';

const machineOf = (fleetNumber: string) => {
  const m = DEMO_MACHINES.find((x) => x.fleetNumber === fleetNumber);
  if (!m) throw new Error(`The demo has no machine ${fleetNumber}`);
  return m;
};

export interface DemoExtras {
  meters: { id: string; fleetNumber: string; kind: (typeof DEMO_EXTRA_METERS)[number]['kind'] }[];
  /** the extra meters' readings, each with its meter id */
  readings: (DemoReading & { fleetNumber: string; meterId: string })[];
  spans: (DemoSpan & DemoHitch)[];
}

/**
 * The extra meters and their readings, and the hitch spans; sets each implement of the hitch log
 * into `history` with the readings its spans give it.
 */
export function buildHitchesAndMeters(
  history: Map<string, MachineReadings>,
  today: Date,
): DemoExtras {
  const spansOn = new Map<string, DemoSpan[]>();
  const extras: DemoExtras = { meters: [], readings: [], spans: [] };
  for (const h of DEMO_HITCHES) {
    const tractor = machineOf(h.tractor);
    const spans = planSpans(
      h,
      history.get(h.tractor)!.readings,
      orgOf(tractor.organization).timeZone,
      today,
    );
    const key = `${h.tractor}/${h.meterKind}`;
    spansOn.set(key, [...(spansOn.get(key) ?? []), ...spans]);
    extras.spans.push(...spans.map((s) => ({ ...h, ...s })));
  }

  const meterReadings = new Map<string, DemoReading[]>();
  for (const x of DEMO_EXTRA_METERS) {
    const { organization } = machineOf(x.fleetNumber);
    const id = demoId(demoMeterName(organization, x.fleetNumber, x.kind));
    const spans = spansOn.get(`${x.fleetNumber}/${x.kind}`) ?? [];
    const readings = deriveMeterReadings(
      { ...x, organization },
      history.get(x.fleetNumber)!.readings,
      (from, to) => coveredShare(spans, from, to, today.getTime()),
    );
    meterReadings.set(`${x.fleetNumber}/${x.kind}`, readings);
    extras.meters.push({ id, fleetNumber: x.fleetNumber, kind: x.kind });
    extras.readings.push(
      ...readings.map((r) => ({ ...r, fleetNumber: x.fleetNumber, meterId: id })),
    );
  }

  for (const h of DEMO_HITCHES) {
    const key = `${h.tractor}/${h.meterKind}`;
    const meter =
      h.meterKind === 'engine_hours' ? history.get(h.tractor)!.readings : meterReadings.get(key);
    if (!meter) throw new Error(`${h.tractor} has no ${h.meterKind} meter in the demo`);
    const spans = extras.spans.filter((s) => s.implement === h.implement);
    history.set(h.implement, { readings: hitchReadings(spans, meter, today), replacement: null });
  }
  return extras;
}

/** Writes the extra meters (before their readings) and the hitch spans. */
export async function writeHitchesAndMeters(extras: DemoExtras, transaction: Transaction) {
  await MachineMeter.bulkCreate(
    extras.meters.map((x, i) => {
      const m = machineOf(x.fleetNumber);
      return {
        id: x.id,
        organizationId: orgId(m.organization),
        machineId: machineId(m),
        kind: x.kind,
        unit: METER_KIND_UNITS[x.kind],
        position: 1 + i,
      };
    }),
    { transaction },
  );
  await HitchSpan.bulkCreate(
    extras.spans.map((s, i) => {
      const implement = machineOf(s.implement);
      const tractor = machineOf(s.tractor);
      return {
        id: demoId(`hitch/${implement.organization}/${s.implement}/${i}`),
        organizationId: orgId(implement.organization),
        implementId: machineId(implement),
        tractorId: machineId(tractor),
        meterKind: s.meterKind,
        startedAt: s.startedAt,
        endedAt: s.endedAt,
        enteredBy: tractor.operators?.length ? userId(tractor.operators[0]) : null,
        createdAt: s.endedAt ?? s.startedAt,
        updatedAt: s.endedAt ?? s.startedAt,
      };
    }),
    { transaction },
  );
}
