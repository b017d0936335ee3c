// Query keys of the team settings, general to specific, so a mutation can invalidate exactly
// the lists it changed.
export const memberKeys = {
  all: ['members'] as const,
  lists: () => [...memberKeys.all, 'list'] as const,
  list: (orgId: string) => [...memberKeys.lists(), orgId] as const,
};

export const invitationKeys = {
  all: ['invitations'] as const,
  lists: () => [...invitationKeys.all, 'list'] as const,
  list: (orgId: string) => [...invitationKeys.lists(), orgId] as const,
};

export const organizationKeys = {
  all: ['organizations'] as const,
  details: () => [...organizationKeys.all, 'detail'] as const,
  detail: (orgId: string) => [...organizationKeys.details(), orgId] as const,
};

export const accountKeys = {
  all: ['account'] as const,
  detail: () => [...accountKeys.all, 'detail'] as const,
};
