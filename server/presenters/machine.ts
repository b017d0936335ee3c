import type { Machine, MachineForecast } from '../models';
import type { DuePoint, UsageEstimate } from '../../shared/domain';
import type { LastReading, Machine as MachineJson, Usage } from '../../shared/schemas/machines';

/** The last reading of a forecast summary, in both scales. */
export function presentLastReading(
  f:
    | { lastValue: number | null; lastRawValue?: number | null; lastTakenAt: Date | null }
    | null
    | undefined,
): LastReading | null {
  if (!f || f.lastValue == null || !f.lastTakenAt) return null;
  return {
    value: f.lastRawValue ?? f.lastValue,
    lifetimeValue: f.lastValue,
    takenAt: f.lastTakenAt.toISOString(),
  };
}

const photoUrls = (m: Machine) => {
  if (!m.photoKey) return { photoUrl: null, thumbnailUrl: null };
  // The key changes with every upload, so the URL does too (safe to cache).
  const base = `/api/v1/organizations/${m.organizationId}/machines/${m.id}/photo?v=${m.photoKey.slice(-8)}`;
  return { photoUrl: base, thumbnailUrl: `${base}&size=thumb` };
};

export function presentMachine(
  m: Machine,
  extra: {
    operatorIds: string[];
    forecast?: MachineForecast | null;
    /** the worst status of its tasks, as the fleet query reads it */
    dueStatus?: string | null;
    nextDueDate?: string | null;
  },
): MachineJson {
  return {
    id: m.id,
    fleetNumber: m.fleetNumber,
    name: m.name,
    category: m.category,
    machineClass: m.machineClass ?? null,
    make: m.make,
    model: m.model,
    serialNumber: m.serialNumber,
    year: m.year,
    purchasePriceMinor: m.purchasePriceMinor,
    listPriceMinor: m.listPriceMinor,
    meterUnit: m.meterUnit,
    status: m.status,
    seasonMonths: m.seasonMonths,
    notes: m.notes,
    operatorIds: extra.operatorIds,
    lastReading: presentLastReading(extra.forecast),
    dueStatus: (extra.dueStatus as DuePoint['status'] | undefined) ?? null,
    nextDueDate: extra.nextDueDate ?? null,
    ...photoUrls(m),
  };
}

export const presentUsage = (u: UsageEstimate | null): Usage | null =>
  u
    ? {
        method: u.method,
        rate: u.rate,
        low: u.low,
        high: u.high,
        readingCount: u.readingCount,
        explanation: u.explanation,
      }
    : null;
