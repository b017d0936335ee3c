import bcrypt from 'bcryptjs';
import { Op, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { env } from '../env';
import { AppError, invalid } from '../errors';
import { Invitation, Membership, Organization, PasswordReset, User } from '../models';
import type { InvitationCreateInput } from '../../shared/schemas/auth';
import { ROLE_LABELS } from '../../shared/constants';
import type { OrgAccess } from '../policies/access';
import { rolesFor } from '../policies/membership';
import { queueMessage } from '../infra/mailer';
import { hashToken, newToken } from '../infra/tokens';
import { recordAudit } from '../infra/audit';
import { hashPassword } from '../infra/password-hash';
import { endOtherSessions } from '../infra/session';
import { forgetFailures, throttleKey } from './sign-in-throttle';

export const INVITATION_DAYS = 7;
export const RESET_MINUTES = 60;
// A reset request answers no sooner than this whether the e-mail has an account or not: the
// known one writes a link and an outbox row, the unknown one nothing, and the time must not tell.
export const RESET_ANSWER_MS = 250;

export { hashPassword };

const byEmail = (email: string) =>
  sequelize.where(sequelize.fn('lower', sequelize.col('email')), email.toLowerCase());

export async function loadMemberships(userId: string) {
  return Membership.findAll({
    where: { userId },
    include: [{ model: Organization, as: 'organization' }],
  });
}

/** Who invites: a member (their access), or the server's operator (`org:create`, no user). */
export type Inviter = Pick<OrgAccess, 'organization'> & { userId: string | null };

/** Creates an invitation and e-mails its single-use link. */
export async function inviteMember(access: Inviter, input: InvitationCreateInput) {
  if (!rolesFor(access).includes(input.role)) {
    throw invalid({
      role: `Role must be one of: ${rolesFor(access).join(', ')} in this organization`,
    });
  }
  const existing = await Membership.findOne({
    where: { organizationId: access.organization.id },
    include: [
      {
        model: User,
        as: 'user',
        where: sequelize.where(sequelize.fn('lower', sequelize.col('user.email')), input.email),
      },
    ],
  });
  if (existing) throw invalid({ email: 'This person is a member already' });
  const { token, hash } = newToken();
  // The mail says who asks: a member by name and e-mail, or the server's operator (org:create).
  const inviter = access.userId
    ? await User.findByPk(access.userId, { attributes: ['name', 'email'] })
    : null;
  const org = access.organization;
  const role = ROLE_LABELS[input.role].toLowerCase();
  const who = inviter ? `${inviter.name} (${inviter.email})` : "Hourstone's operator";
  const invitation = await sequelize.transaction(async (transaction) => {
    const row = await Invitation.create(
      {
        organizationId: access.organization.id,
        email: input.email,
        name: input.name,
        role: input.role,
        tokenHash: hash,
        invitedBy: access.userId,
        expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000),
        acceptedAt: null,
      },
      { transaction },
    );
    await recordAudit(
      {
        organizationId: access.organization.id,
        actorUserId: access.userId,
        action: 'invitation.create',
        entityType: 'invitation',
        entityId: row.id,
        changes: { email: input.email, role: input.role },
      },
      transaction,
    );
    const link = `${env.APP_URL}/invitations/${token}`;
    await queueMessage(
      {
        organizationId: access.organization.id,
        recipient: input.email,
        kind: 'invitation',
        periodKey: row.id,
        subject: `You are invited to ${org.name} on Hourstone`,
        text: [
          `Hello ${input.name},`,
          '',
          `${who} invited you to join ${org.name} on Hourstone with the role of ${role}.`,
          `Open this link to set your password and join (it works once and expires in ${INVITATION_DAYS} days):`,
          link,
          '',
          'If you did not expect this, ignore this message.',
        ].join('\n'),
        html: `<p>Hello ${escapeHtml(input.name)},</p><p>${escapeHtml(who)} invited you to join <strong>${escapeHtml(org.name)}</strong> on Hourstone with the role of <strong>${role}</strong>.</p><p><a href="${link}">Set your password and join</a> (works once, expires in ${INVITATION_DAYS} days).</p><p>If you did not expect this, ignore this message.</p>`,
        ...(inviter && { headers: { 'Reply-To': inviter.email } }),
      },
      transaction,
    );
    return row;
  });
  return invitation;
}

/** A pending, unexpired invitation for this token, or 404. */
export async function findOpenInvitation(token: string) {
  const invitation = await Invitation.findOne({
    where: { tokenHash: hashToken(token), acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
    include: [{ model: Organization, as: 'organization' }],
  });
  if (!invitation)
    throw new AppError(404, 'not_found', 'This invitation has expired or was already used');
  return invitation;
}

/** Accepts an invitation: creates or updates the user and the membership, once. */
export async function acceptInvitation(
  token: string,
  name: string,
  password: string,
): Promise<User> {
  const passwordHash = await hashPassword(password);
  return sequelize.transaction(async (transaction) => {
    const invitation = await Invitation.findOne({
      where: { tokenHash: hashToken(token), acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!invitation)
      throw new AppError(404, 'not_found', 'This invitation has expired or was already used');
    let user = await User.findOne({
      where: sequelize.where(
        sequelize.fn('lower', sequelize.col('email')),
        invitation.email.toLowerCase(),
      ),
      transaction,
    });
    if (user?.passwordHash) {
      // An existing account joins with its own password: an invitation never resets a password
      // (otherwise whoever holds the link could take over the account).
      if (!(await bcrypt.compare(password, user.passwordHash))) {
        throw invalid({
          password:
            'An account with this e-mail exists already: enter its current password to join (or reset it first)',
        });
      }
    } else if (user) await user.update({ name, passwordHash }, { transaction });
    else
      user = await User.create(
        { email: invitation.email.toLowerCase(), name, passwordHash },
        { transaction },
      );
    await Membership.findOrCreate({
      where: { organizationId: invitation.organizationId, userId: user.id },
      defaults: {
        organizationId: invitation.organizationId,
        userId: user.id,
        role: invitation.role,
      },
      transaction,
    });
    await invitation.update({ acceptedAt: new Date() }, { transaction });
    await recordAudit(
      {
        organizationId: invitation.organizationId,
        actorUserId: user.id,
        action: 'invitation.accept',
        entityType: 'membership',
        entityId: user.id,
        changes: { role: invitation.role },
      },
      transaction,
    );
    return user;
  });
}

const NO_USER = '00000000-0000-0000-0000-000000000000';

const waitUntil = (at: number) =>
  new Promise<void>((resolve) => setTimeout(resolve, Math.max(0, at - Date.now())));

/**
 * Starts a password reset: a new link voids the older ones. Silent when the e-mail is unknown,
 * and answers after RESET_ANSWER_MS either way, so neither the answer nor its time tells
 * whether an account exists.
 */
export async function requestPasswordReset(email: string): Promise<void> {
  const answerAt = Date.now() + RESET_ANSWER_MS;
  try {
    await writePasswordReset(email);
  } finally {
    await waitUntil(answerAt);
  }
}

async function writePasswordReset(email: string): Promise<void> {
  const { token, hash } = newToken();
  const link = `${env.APP_URL}/reset-password?token=${token}`;
  // The reset and its e-mail commit together; the worker sends it (the request never waits on SMTP).
  await sequelize.transaction(async (transaction) => {
    // Locking the account makes two requests at once leave exactly one live link.
    const user = await User.findOne({
      where: byEmail(email),
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    await voidOpenResets(user?.id ?? NO_USER, transaction);
    if (!user) return;
    const reset = await PasswordReset.create(
      {
        userId: user.id,
        tokenHash: hash,
        expiresAt: new Date(Date.now() + RESET_MINUTES * 60_000),
        usedAt: null,
      },
      { transaction },
    );
    await queueMessage(
      {
        organizationId: null,
        recipient: user.email,
        kind: 'password_reset',
        periodKey: reset.id,
        subject: 'Reset your Hourstone password',
        text: `Hello ${user.name},\n\nOpen this link to choose a new password. It works once and expires in ${RESET_MINUTES} minutes:\n${link}\n\nIf you did not ask for this, ignore this message; your password stays as it is.`,
        html: `<p>Hello ${escapeHtml(user.name)},</p><p><a href="${link}">Choose a new password</a>. The link works once and expires in ${RESET_MINUTES} minutes.</p><p>If you did not ask for this, ignore this message; your password stays as it is.</p>`,
      },
      transaction,
    );
  });
}

/** Voids the user's open reset links (a newer link, or the password just changed). */
async function voidOpenResets(userId: string, transaction: Transaction) {
  await PasswordReset.update(
    { expiresAt: new Date() },
    { where: { userId, usedAt: null, expiresAt: { [Op.gt]: new Date() } }, transaction },
  );
}

/**
 * Sets a new password with a reset token (single use, unexpired, the newest of its user). Every
 * session of the user ends and the account's failed sign-ins are forgotten.
 */
export async function confirmPasswordReset(token: string, password: string): Promise<User> {
  const passwordHash = await hashPassword(password);
  const user = await sequelize.transaction(async (transaction) => {
    const reset = await PasswordReset.findOne({
      where: { tokenHash: hashToken(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!reset)
      throw invalid({ token: 'This link has expired or was already used. Ask for a new one.' });
    const user = await User.findByPk(reset.userId, { transaction });
    if (!user)
      throw invalid({ token: 'This link has expired or was already used. Ask for a new one.' });
    await user.update({ passwordHash }, { transaction });
    await reset.update({ usedAt: new Date() }, { transaction });
    await voidOpenResets(user.id, transaction);
    await endOtherSessions(user.id, null, transaction);
    await recordAudit(
      {
        organizationId: null,
        actorUserId: user.id,
        action: 'password.reset',
        entityType: 'user',
        entityId: user.id,
      },
      transaction,
    );
    return user;
  });
  await forgetFailures(throttleKey(user.email));
  return user;
}

export function escapeHtml(s: string): string {
  return s.replace(
    /[&<>"']/g,
    (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!,
  );
}
