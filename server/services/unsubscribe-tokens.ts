// One-click unsubscribe (RFC 8058) from the due digest: a signed token naming the membership.
import { createHmac, timingSafeEqual } from 'node:crypto';
import { env } from '../env';
import { Membership, NotificationPreference, Organization } from '../models';

const UNSUBSCRIBE_KIND = 'due_digest';

function signature(membershipId: string): string {
  return createHmac('sha256', env.JWT_SECRET)
    .update(`unsubscribe:${membershipId}:${UNSUBSCRIBE_KIND}`)
    .digest('base64url');
}

/** A token naming the membership, signed with JWT_SECRET so it cannot be forged for another. */
export function unsubscribeToken(membershipId: string): string {
  return `${membershipId}.${signature(membershipId)}`;
}

/** The membership id of a genuine token, else null. */
export function verifyUnsubscribeToken(token: string): string | null {
  const [membershipId, given, extra] = token.split('.');
  if (!membershipId || !given || extra !== undefined) return null;
  const expected = Buffer.from(signature(membershipId));
  const actual = Buffer.from(given);
  if (expected.length !== actual.length || !timingSafeEqual(expected, actual)) return null;
  return membershipId;
}

/** Turns the person's digest off; null when the token is not genuine or the membership is gone. */
export async function unsubscribe(token: string): Promise<{ organizationName: string } | null> {
  const membershipId = verifyUnsubscribeToken(token);
  if (!membershipId) return null;
  const membership = await Membership.findByPk(membershipId, {
    include: [{ model: Organization, as: 'organization' }],
  });
  if (!membership?.organization) return null;
  const existing = await NotificationPreference.findByPk(membershipId);
  if (existing) await existing.update({ frequency: 'off' });
  else
    await NotificationPreference.create({
      membershipId,
      organizationId: membership.organizationId,
      frequency: 'off',
    });
  return { organizationName: membership.organization.name };
}
