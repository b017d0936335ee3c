import type { WalkaroundCreateInput } from '../../../../shared/schemas/walkarounds';
import { apiClient, segment } from '../../../lib/api-client';
import type { WalkaroundOutcome } from './types';

/**
 * POST walkarounds. Safe to repeat: a clientId the server already has answers 200 with the first
 * submission (duplicate: true), so a resend after a lost answer is not doubled.
 */
export const submitWalkaround = (orgId: string, input: WalkaroundCreateInput) =>
  apiClient.post<WalkaroundOutcome>(`/organizations/${segment(orgId)}/walkarounds`, input);
