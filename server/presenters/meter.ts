import type { MachineForecast, MachineMeter } from '../models';
import type { MachineMeterJson } from '../../shared/schemas/meters';
import { presentLastReading, presentUsage } from './machine';

/** One meter with its last reading and usage (from its own stored summary) and what uses it. */
export const presentMeter = (
  m: MachineMeter,
  extra: { forecast?: MachineForecast | null; taskCount?: number } = {},
): MachineMeterJson => ({
  id: m.id,
  machineId: m.machineId,
  kind: m.kind,
  unit: m.unit,
  label: m.label,
  isPrimary: m.isPrimary,
  position: m.position,
  lastReading: presentLastReading(extra.forecast),
  usage: presentUsage(extra.forecast?.usage ?? null),
  readingCount: extra.forecast?.readingCount ?? 0,
  taskCount: extra.taskCount ?? 0,
});
