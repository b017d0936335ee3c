// Season hours (issue 17): each machine's use in its season this year against last year's (from
// its primary meter's stored daily summary), and the manager's plan for a season, kept on the
// machine (migration 0029) and fed to the forecast (shared/domain/season-use.ts).
import { QueryTypes } from 'sequelize';
import { sequelize } from '../db';
import { directQuery } from '../db-direct';
import { recordAudit } from '../infra/audit';
import type { Machine } from '../models';
import type { OrgAccess } from '../policies/access';
import { hasRole } from '../policies/access';
import {
  dayNumberFromIso,
  plannedUse,
  seasonDays,
  seasonUse,
  todayIso,
  type ReadingPoint,
  type SeasonPlan,
  type SeasonPlans,
} from '../../shared/domain';
import type { SeasonPlanInput, SeasonPlanJson } from '../../shared/schemas/season-hours';
import { visibleToOperator } from './due-rows';
import { recomputeDuePoints } from './forecast';
import { PRIMARY_FORECAST_JOIN } from './primary-forecast';

const round1 = (n: number) => Math.round(n * 10) / 10;

/** A stored plan as the API shows it, for the season `year`. */
export function presentPlan(year: number, plan: SeasonPlan | undefined): SeasonPlanJson | null {
  if (!plan) return null;
  const use = plannedUse(plan, plan.unit);
  return {
    year,
    value: plan.value ?? null,
    area: plan.area ?? null,
    areaUnit: plan.areaUnit ?? null,
    areaPerHour: plan.areaPerHour ?? null,
    plannedUse: use === null ? null : round1(use),
    unit: plan.unit,
  };
}

interface SeasonRow {
  id: string;
  fleet_number: string;
  name: string;
  season_months: number[];
  season_plans: SeasonPlans;
  unit: string;
  daily: ReadingPoint[] | null;
}

/**
 * Every machine (not sold) the caller may see with its season use: this year's season up to
 * today, last year's up to the same date and last year's whole season; and its plan for `year`.
 */
export async function seasonHours(access: OrgAccess, year: number, now = new Date()) {
  const asOf = todayIso(access.organization.timeZone, now);
  const rows = await sequelize.query<SeasonRow>(
    `SELECT m.id, m.fleet_number, m.name, m.season_months, m.season_plans, pm.unit, f.daily
       FROM machines m ${PRIMARY_FORECAST_JOIN}
      WHERE m.organization_id = :org AND m.status <> 'sold'
        ${hasRole(access, 'operator') ? `AND ${visibleToOperator()}` : ''}
      ORDER BY m.fleet_number`,
    { replacements: { org: access.organization.id, user: access.userId }, type: QueryTypes.SELECT },
  );
  // "to date": the same day of the year in the year before (day numbers a year apart)
  const today = dayNumberFromIso(asOf);
  const yearShift = dayNumberFromIso(`${year}-01-01`) - dayNumberFromIso(`${year - 1}-01-01`);
  return {
    asOf,
    rows: rows.map((r) => {
      const daily = [...(r.daily ?? [])].sort((a, b) => a.day - b.day);
      const thisYear = seasonDays(year, r.season_months);
      const lastYear = seasonDays(year - 1, r.season_months);
      return {
        machine: { id: r.id, fleetNumber: r.fleet_number, name: r.name },
        unit: r.unit,
        seasonMonths: r.season_months,
        thisSeason: round1(seasonUse(daily, thisYear, today + 1)),
        lastSeasonToDate: round1(seasonUse(daily, lastYear, today + 1 - yearShift)),
        lastSeason: round1(seasonUse(daily, lastYear)),
        plan: presentPlan(year, r.season_plans?.[String(year)]),
      };
    }),
  };
}

/** The machine's primary meter (id and unit): what a plan is made on. */
async function primaryMeter(machine: Machine) {
  const [meter] = await directQuery<{ id: string; unit: string }>(
    undefined,
    'SELECT id, unit FROM machine_meters WHERE machine_id = $1 AND organization_id = $2 AND is_primary',
    [machine.id, machine.organizationId],
  );
  return meter;
}

/**
 * Sets (or, with null, removes) a machine's plan for the season `year`, in one statement that
 * changes only that year's entry, and brings its forecast up to date with it.
 */
export async function setSeasonPlan(
  access: OrgAccess,
  machine: Machine,
  year: number,
  input: SeasonPlanInput | null,
): Promise<SeasonPlanJson | null> {
  const meter = await primaryMeter(machine);
  const plan: SeasonPlan | null = input && {
    meterId: meter.id,
    unit: meter.unit,
    ...(input.value !== undefined
      ? { value: input.value }
      : { area: input.area, areaUnit: input.areaUnit, areaPerHour: input.areaPerHour }),
  };
  await sequelize.transaction(async (transaction) => {
    await directQuery(
      transaction,
      plan
        ? `UPDATE machines SET season_plans = jsonb_set(season_plans, ARRAY[$3::text], $4::jsonb), updated_at = now()
           WHERE id = $1 AND organization_id = $2`
        : `UPDATE machines SET season_plans = season_plans - $3::text, updated_at = now()
           WHERE id = $1 AND organization_id = $2`,
      plan
        ? [machine.id, machine.organizationId, String(year), JSON.stringify(plan)]
        : [machine.id, machine.organizationId, String(year)],
    );
    await recordAudit(
      {
        organizationId: machine.organizationId,
        actorUserId: access.userId,
        action: plan ? 'machine.season_plan' : 'machine.season_plan_remove',
        entityType: 'machine',
        entityId: machine.id,
        changes: { year, plan },
      },
      transaction,
    );
  });
  await recomputeDuePoints(machine.organizationId, [machine.id], {
    timeZone: access.organization.timeZone,
  });
  return plan && presentPlan(year, plan);
}
