import { Organization } from '../server/models';
import { recomputeDuePoints } from '../server/services/forecast';
import { withJobLock } from './lock';

/** Recomputes every organization's due points for the new day (status moves with the calendar). */
export async function perform(now = new Date()) {
  return withJobLock('refresh-forecasts', async () => {
    const orgs = await Organization.findAll({ where: { kind: 'farm' } });
    for (const org of orgs)
      await recomputeDuePoints(org.id, undefined, { timeZone: org.timeZone, now });
    return { organizations: orgs.length };
  });
}
