import type { Hazard } from '../../shared/schemas/schedule';
import type { ShopWeek } from '../../shared/schemas/service-record-responses';
import type { ShopWeekData } from '../services/shop-week';
import { presentMachineRef } from './defect';
import type { PeopleLookup } from './people';

type Plan = ShopWeekData['days'][number]['planned'][number];

/** Everyone a week's plans name, for one `peopleById` lookup. */
export const shopWeekPeopleIds = (week: ShopWeekData) =>
  week.days.flatMap((d) => d.planned.flatMap((p) => p.technicianIds));

const presentPlan = (p: Plan, people: PeopleLookup) => ({
  id: p.id,
  plannedFor: p.plannedFor,
  machine: presentMachineRef(p.machine),
  tasks: p.tasks.map((t) => ({ ...t, hazards: t.hazards as Hazard[] })),
  technicians: p.technicianIds.map((id) => people(id) ?? { id, name: 'Former member' }),
  notes: p.notes,
  defectIds: p.defectIds,
  estimatedLabourHours: p.estimatedLabourHours,
  partsToPull: p.partsToPull,
  fluidsToPull: p.fluidsToPull,
});

/** The shop's week with each plan's machine as a reference and its technicians by name. */
export function presentShopWeek(week: ShopWeekData, people: PeopleLookup): ShopWeek {
  return {
    ...week,
    days: week.days.map((d) => ({ ...d, planned: d.planned.map((p) => presentPlan(p, people)) })),
  };
}
