import type { QueryClient } from '@tanstack/react-query';
import { changedByDefects, defectKeys } from './keys';

/** A defect change can move the machine in or out of service: every list showing it goes stale. */
export const invalidateAfterDefectChange = (queryClient: QueryClient) =>
  Promise.all(
    [defectKeys.all, ...changedByDefects].map((queryKey) =>
      queryClient.invalidateQueries({ queryKey }),
    ),
  );
