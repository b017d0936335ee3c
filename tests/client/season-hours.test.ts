// Season hours (issue 17) in the client: which writes leave the page stale — a plan moves the
// machine's forecast, so its due figures refresh with it; readings move the season's use — and
// how a machine's season months read on its card.
import { describe, expect, it } from 'vitest';
import { QueryClient, type QueryKey } from '@tanstack/react-query';
import { queryKeys as k } from '../../src/lib/query-keys';
import { changedBy, invalidate } from '../../src/lib/invalidation';
import { seasonLabel } from '../../src/features/season-hours/lib/season-label';

const ORG = 'org-1';
const OTHER_ORG = 'org-2';
const M = 'machine-1';
const OTHER_M = 'machine-2';

const cached: Record<string, QueryKey> = {
  seasonHours: k.seasonHours.year(ORG, 2027),
  otherYear: k.seasonHours.year(ORG, 2026),
  machineTasks: k.tasks.machine(ORG, M),
  otherMachineTasks: k.tasks.machine(ORG, OTHER_M),
  machineDetail: k.machines.detail(ORG, M),
  dueList: k.due.list(ORG, { horizon: 30, page: 1 }),
  shopWeek: k.shopWeek.week(ORG, null),
  otherOrgSeasonHours: k.seasonHours.year(OTHER_ORG, 2027),
};

async function staleAfter(keys: QueryKey[]) {
  const queryClient = new QueryClient();
  for (const key of Object.values(cached)) queryClient.setQueryData(key, { cached: true });
  await invalidate(queryClient, keys);
  return Object.entries(cached)
    .filter(([, key]) => queryClient.getQueryState(key)?.isInvalidated)
    .map(([name]) => name);
}

describe('season hours keys — what a plan or a reading refreshes', () => {
  it('a plan set or removed: every year of season hours and that machine’s due figures, not another machine’s tasks or farm', async () => {
    expect(await staleAfter(changedBy.seasonPlan(ORG, M))).toEqual([
      'seasonHours',
      'otherYear',
      'machineTasks',
      'machineDetail',
      'dueList',
      'shopWeek',
    ]);
  });

  it('a reading on one machine, or readings of many, refresh season hours of that farm only', async () => {
    for (const keys of [changedBy.machineReadings(ORG, M), changedBy.readings(ORG)]) {
      const stale = await staleAfter(keys);
      expect(stale).toContain('seasonHours');
      expect(stale).not.toContain('otherOrgSeasonHours');
    }
  });

  it('a schedule edit leaves season hours as they are (it moves no reading)', async () => {
    expect(await staleAfter(changedBy.schedule(ORG, M))).not.toContain('seasonHours');
  });
});

describe('seasonLabel — a machine’s season months on its card (English month abbreviations)', () => {
  it('no months or all twelve: all year', () => {
    expect(seasonLabel([])).toBe('All year');
    expect(seasonLabel([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12])).toBe('All year');
  });
  it('a run of months: first–last; a run over New Year stays one run', () => {
    expect(seasonLabel([8, 9, 10])).toBe('Aug–Oct');
    expect(seasonLabel([1, 2, 11, 12])).toBe('Nov–Feb');
  });
  it('months apart are listed, a single month alone', () => {
    expect(seasonLabel([3, 4, 9])).toBe('Mar–Apr, Sep');
  });
});
