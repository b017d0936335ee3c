import { useEffect } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { latestReadingsQueryOptions } from '../features/readings/api/get-latest-readings';
import { checklistQueryOptions } from '../features/walkarounds/api/get-checklist';
import { pickableMachinesQueryOptions } from '../features/walkarounds/api/get-pickable-machines';
import { findMembership, useMe } from '../lib/auth';

/** Checklists read ahead per visit: an operator's own machines, else the first of the fleet. */
const CHECKLISTS_AHEAD = 40;
/** After the first page has what it needs: the read-ahead must not slow the first load. */
const DELAY_MS = 4_000;

const warmed = new Set<string>();

/**
 * Once per app start and farm, while online: reads what the yard work needs without a
 * connection — the machines to walk round, their checklists and the last readings for Log
 * hours — so the service worker holds this person's copy (cleared again at sign-out).
 */
export function OfflineWarmUp() {
  const { orgId = '' } = useParams();
  const queryClient = useQueryClient();
  const me = useMe().data;
  const membership = me ? findMembership(me, orgId) : undefined;
  const works = membership?.organization.kind === 'farm' && membership.role !== 'advisor';
  const userId = me?.user.id;

  useEffect(() => {
    if (!works || !userId || warmed.has(`${userId}/${orgId}`)) return;
    const timer = window.setTimeout(async () => {
      if (!navigator.onLine) return;
      warmed.add(`${userId}/${orgId}`);
      try {
        void queryClient.prefetchQuery(latestReadingsQueryOptions(orgId));
        const machines = await queryClient.fetchQuery(pickableMachinesQueryOptions(orgId));
        const walkable = machines.filter((m) => m.status !== 'tagged_out');
        const mine = walkable.filter((m) => m.operatorIds.includes(userId));
        for (const machine of (mine.length ? mine : walkable).slice(0, CHECKLISTS_AHEAD))
          await queryClient.prefetchQuery(checklistQueryOptions(orgId, machine.id, 'use'));
      } catch {
        warmed.delete(`${userId}/${orgId}`); // tried again on the next start
      }
    }, DELAY_MS);
    return () => window.clearTimeout(timer);
  }, [works, userId, orgId, queryClient]);

  return null;
}
