// The machine page's meters (issue 13): which writes leave a machine's meter list stale. Each
// meter shows its last reading and how many tasks count on it, so readings and schedule edits
// must refresh it; another machine's list stays.
import { describe, expect, it } from 'vitest';
import { QueryClient, type QueryKey } from '@tanstack/react-query';
import { queryKeys as k } from '../../src/lib/query-keys';
import { changedBy, invalidate } from '../../src/lib/invalidation';
import { meterKeys } from '../../src/lib/meters';

const ORG = 'org-1';
const M = 'machine-1';
const OTHER_M = 'machine-2';

async function staleAfter(keys: QueryKey[]) {
  const queryClient = new QueryClient();
  const cached = {
    meters: meterKeys.machine(ORG, M),
    otherMeters: meterKeys.machine(ORG, OTHER_M),
    ptoReadings: meterKeys.readings(ORG, M, 'pto'),
  };
  for (const key of Object.values(cached)) queryClient.setQueryData(key, { cached: true });
  await invalidate(queryClient, keys);
  return Object.entries(cached)
    .filter(([, key]) => queryClient.getQueryState(key)?.isInvalidated)
    .map(([name]) => name);
}

describe('meter keys — what refreshes a machine’s meters', () => {
  it('the meter list is the readings key of meters, one per machine', () => {
    expect(meterKeys.machine(ORG, M)).toEqual(k.readings.meters(ORG, M));
    expect(meterKeys.machine(ORG, M)).not.toEqual(meterKeys.machine(ORG, OTHER_M));
  });

  it('a schedule edit — the machine’s meters (their task counts), not another machine’s', async () => {
    expect(await staleAfter(changedBy.schedule(ORG, M))).toEqual(['meters']);
  });

  it('a reading logged — the meters and each meter’s readings (the chart and history)', async () => {
    expect(await staleAfter(changedBy.machineReadings(ORG, M))).toEqual([
      'meters',
      'otherMeters',
      'ptoReadings',
    ]);
  });
});
