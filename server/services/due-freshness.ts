// Whether farms' due points are today's before a list reads them, asked of many farms at once
// (the dealer's board asks it of every customer, the due list and the digest of one farm). Due
// points are recomputed the first time a farm is read on a new local day; every other read only
// needs to know that none are stale, which the forecasts' (organization, computed_on) index
// answers without reading each machine (migration 0025).
import { QueryTypes } from 'sequelize';
import { sequelize } from '../db';
import { todayIso } from '../../shared/domain';
import { ensureDuePointsCurrent } from './forecast';

/**
 * The farms (of those given, each with its local today) with a forecast not computed today, or
 * with a meter that has no forecast yet (fewer forecasts than meters).
 */
const STALE_FARMS_SQL = `SELECT h.id FROM unnest(ARRAY[:ids]::uuid[], ARRAY[:asOfs]::date[]) AS h(id, as_of)
  WHERE EXISTS (SELECT 1 FROM machine_forecasts f WHERE f.organization_id = h.id
                  AND (f.computed_on IS NULL OR f.computed_on < h.as_of OR f.computed_on > h.as_of))
     OR (SELECT count(*) FROM machine_meters m WHERE m.organization_id = h.id)
        > (SELECT count(*) FROM machine_forecasts f WHERE f.organization_id = h.id)`;

export interface FarmClock {
  id: string;
  timeZone: string;
}

/** The farms (of those given) whose due points are not all today's at `now`. */
export async function staleFarms(farms: FarmClock[], now = new Date()): Promise<FarmClock[]> {
  if (!farms.length) return [];
  const stale = await sequelize.query<{ id: string }>(STALE_FARMS_SQL, {
    replacements: {
      ids: farms.map((f) => f.id),
      asOfs: farms.map((f) => todayIso(f.timeZone, now)),
    },
    type: QueryTypes.SELECT,
  });
  const byId = new Map(farms.map((f) => [f.id, f]));
  return stale.map(({ id }) => byId.get(id)!);
}

/** Recomputes the stale due points of these farms (the farm's own check names its machines). */
export async function refreshFarms(farms: FarmClock[], now = new Date()): Promise<void> {
  for (const f of farms) await ensureDuePointsCurrent(f.id, f.timeZone, now);
}

/** Brings the due points of these farms up to date (each in its own time zone) at `now`. */
export async function bringDuePointsCurrent(farms: FarmClock[], now = new Date()): Promise<void> {
  await refreshFarms(await staleFarms(farms, now), now);
}

/**
 * Runs `read` at once beside the check that the farms' due points are today's (a list's reads
 * need not wait a round trip for a check that nearly always finds nothing); on the rare first read
 * of a new day it recomputes what is stale and reads again, so no answer is built on old points.
 */
export async function readCurrent<T>(
  farms: FarmClock[],
  now: Date,
  read: () => Promise<T>,
): Promise<T> {
  const [stale, result] = await Promise.all([staleFarms(farms, now), read()]);
  if (!stale.length) return result;
  await refreshFarms(stale, now);
  return read();
}
