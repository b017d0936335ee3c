// The shop outlook's arithmetic, kept pure (no database): which week each service and plan falls
// in, and each week's sums. Parts and fluids are summed by the parts forecast's own rules
// (parts-sum.ts); nothing of the forecast is recomputed here, only read off the stored due points.
import type { UnitSystem } from '../../shared/constants';
import { addDaysIso, dayNumberFromIso } from '../../shared/domain';
import type { OutlookPlan, OutlookService, OutlookWeek } from '../../shared/schemas/shop-outlook';
import { sumPartsForecast, type ForecastService } from './parts-sum';

const round2 = (n: number) => Math.round(n * 100) / 100;

/** ISO 8601 week of a Monday (ISO date): the week belongs to the year of its Thursday. */
export function isoWeekOf(monday: string): string {
  const thursday = addDaysIso(monday, 3);
  const year = thursday.slice(0, 4);
  const dayOfYear = dayNumberFromIso(thursday) - dayNumberFromIso(`${year}-01-01`);
  return `${year}-W${String(Math.floor(dayOfYear / 7) + 1).padStart(2, '0')}`;
}

/** A dated due service with the task's lists, as the outlook buckets it. */
export interface OutlookInput {
  service: OutlookService;
  parts: ForecastService['parts'];
  fluids: ForecastService['fluids'];
}

/**
 * The week (0-based, from `start`, a Monday) a service falls in: overdue ones, and any dated
 * before the first week, in the first; null when it cannot be dated or falls after the last.
 */
export function weekIndexOf(service: OutlookService, start: string, weeks: number): number | null {
  if (service.status === 'overdue') return 0;
  if (!service.dueOn) return null;
  const days = dayNumberFromIso(service.dueOn) - dayNumberFromIso(start);
  const week = Math.max(0, Math.floor(days / 7));
  return week < weeks ? week : null;
}

/** Plans by the week of their date; one dated before `start` in the first (still to do). */
function plansByWeek(plans: OutlookPlan[], start: string, weeks: number): OutlookPlan[][] {
  const byWeek: OutlookPlan[][] = Array.from({ length: weeks }, () => []);
  for (const plan of plans) {
    const days = dayNumberFromIso(plan.plannedFor) - dayNumberFromIso(start);
    const week = Math.max(0, Math.floor(days / 7));
    if (week < weeks) byWeek[week].push(plan);
  }
  return byWeek;
}

/**
 * The outlook's weeks from `start` (a Monday): per week its services (by the date they fall due,
 * overdue in the first week) with their labour summed (tasks without an estimate counted apart)
 * and their parts and fluids summed in `units`, the plans dated in it (open plans dated
 * before `start` in the first week: they are still to do) and the bookings proposed for it.
 */
export function outlookWeeks(
  start: string,
  weeks: number,
  inputs: OutlookInput[],
  plans: OutlookPlan[],
  units: UnitSystem,
  proposed: OutlookPlan[] = [],
): OutlookWeek[] {
  const servicesOf: OutlookInput[][] = Array.from({ length: weeks }, () => []);
  for (const input of inputs) {
    const week = weekIndexOf(input.service, start, weeks);
    if (week !== null) servicesOf[week].push(input);
  }
  const plansOf = plansByWeek(plans, start, weeks);
  const proposedOf = plansByWeek(proposed, start, weeks);
  return servicesOf.map((list, i) => {
    const weekStart = addDaysIso(start, i * 7);
    const weekEnd = addDaysIso(weekStart, 6);
    const forecast: ForecastService[] = list.map(({ service, parts, fluids }) => ({
      customer: service.customer ?? { id: '', name: '' },
      machine: service.machine,
      // parts are first needed the day the service falls due, the week's Monday for an overdue one
      neededOn:
        service.dueOn && service.dueOn >= weekStart && service.status !== 'overdue'
          ? service.dueOn
          : weekStart,
      parts,
      fluids,
    }));
    const summary = sumPartsForecast(forecast, units);
    const services = list.map((s) => s.service);
    const labour = (s: OutlookService[]) => round2(s.reduce((n, x) => n + (x.labourHours ?? 0), 0));
    const weekPlans = plansOf[i];
    return {
      isoWeek: isoWeekOf(weekStart),
      start: weekStart,
      end: weekEnd,
      services,
      labourHours: labour(services),
      labourUnknown: services.filter((s) => s.labourHours === null).length,
      unplannedLabourHours: labour(services.filter((s) => s.plannedOn === null)),
      parts: summary.parts,
      fluids: summary.fluids,
      wearParts: summary.wearParts,
      planned: weekPlans,
      plannedLabourHours: round2(weekPlans.reduce((n, p) => n + p.labourHours, 0)),
      plannedLabourUnknown: weekPlans.reduce((n, p) => n + p.labourUnknown, 0),
      proposed: proposedOf[i],
      proposedLabourHours: round2(proposedOf[i].reduce((n, p) => n + p.labourHours, 0)),
    };
  });
}
