import type { Machine, MachineForecast } from '../models';
import type { DuePoint, UsageEstimate } from '../../shared/domain';
import type { LastReading, Machine as MachineJson, Usage } from '../../shared/schemas/machines';
import type { MachineRestriction } from '../../shared/schemas/machine-restrictions';
import type { OrgAccess } from '../policies/context';

/**
 * A machine's restriction as the caller may read it; null when it has none. A dealer is told
 * that it is restricted and since when, not why (the reason is the farm's own, as a tag-out's is).
 */
export function presentRestriction(
  m: Pick<Machine, 'restrictionReason' | 'restrictedAt'>,
  via: OrgAccess['via'],
): MachineRestriction | null {
  if (m.restrictionReason == null || !m.restrictedAt) return null;
  return {
    reason: via === 'member' ? m.restrictionReason : null,
    since: m.restrictedAt.toISOString(),
  };
}

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
    /** who asks: a dealer is not told a restriction's reason */
    via: OrgAccess['via'];
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
    telematicsId: m.telematicsId ?? null,
    year: m.year,
    purchasePriceMinor: m.purchasePriceMinor,
    listPriceMinor: m.listPriceMinor,
    meterUnit: m.meterUnit,
    status: m.status,
    restriction: presentRestriction(m, extra.via),
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
