import type { BoardFilters } from './types';

// Query keys of the dealer feature, general to specific, per organization: a mutation
// invalidates the narrowest keys it changed.
export const dealerKeys = {
  all: ['dealers'] as const,
  board: (orgId: string) => [...dealerKeys.all, 'board', orgId] as const,
  boardPage: (orgId: string, filters: BoardFilters) =>
    [...dealerKeys.board(orgId), filters] as const,
  parts: (orgId: string, horizon: number, customerId: string | null) =>
    [...dealerKeys.all, 'parts', orgId, horizon, customerId] as const,
  customers: (orgId: string) => [...dealerKeys.all, 'customers', orgId] as const,
  farmLinks: (orgId: string) => [...dealerKeys.all, 'farm-links', orgId] as const,
  invitation: (token: string) => [...dealerKeys.all, 'invitation', token] as const,
  reminderDraft: (orgId: string, customerId: string, taskIds: string[]) =>
    [...dealerKeys.all, 'reminder-draft', orgId, customerId, taskIds] as const,
  bookings: (orgId: string) => [...dealerKeys.all, 'bookings', orgId] as const,
  activity: (orgId: string, dealerId: string | null) =>
    [...dealerKeys.all, 'activity', orgId, dealerId] as const,
};
