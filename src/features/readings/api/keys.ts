// Query keys of meter readings, general to specific. A reading logged for any machine changes
// the organization's latest readings, so writes invalidate `latest(orgId)` (and the due list,
// which the page that writes passes in: features do not import each other).
export const readingKeys = {
  all: ['readings'] as const,
  latests: () => [...readingKeys.all, 'latest'] as const,
  latest: (orgId: string) => [...readingKeys.latests(), orgId] as const,
};
