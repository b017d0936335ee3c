import { Membership, Organization } from '../models';
import { verifyUnsubscribeToken } from './unsubscribe-tokens';

/** The organization an unsubscribe link's membership belongs to, or null (bad link, ended). */
export async function unsubscribeLinkOrganization(token: string) {
  const membershipId = verifyUnsubscribeToken(token);
  const membership = membershipId
    ? await Membership.findByPk(membershipId, {
        include: [{ model: Organization, as: 'organization' }],
      })
    : null;
  return membership?.organization ?? null;
}
