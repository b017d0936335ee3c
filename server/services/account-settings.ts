// A person's own account: its name, a new e-mail address (which takes effect only once a link
// sent to it is opened), and deleting it (never while an organization would lose its last
// manager). Wrong current passwords slow the account down like failed sign-ins.
import { QueryTypes, UniqueConstraintError } from 'sequelize';
import { sequelize } from '../db';
import { env } from '../env';
import { AppError, invalid } from '../errors';
import { User } from '../models';
import type { Account, AccountUpdateInput } from '../../shared/schemas/account';
import { emailChangeConfirmMail, emailChangeTakenMail, emailChangedMail } from './account-mail';
import { recordAudit } from '../infra/audit';
import {
  VERIFY_HOURS,
  emailIs,
  issueVerification,
  pendingEmailChange,
  useVerification,
  voidVerifications,
} from './email-verifications';
import { queueMessage } from '../infra/mailer';
import { lastManagedOrganizations } from './organizations';
import { checkPassword } from '../infra/password-hash';
import { forgetFailures, reserveAttempt, throttleKey, waitInWords } from './sign-in-throttle';

/** The account as its settings page shows it. */
export async function describeAccount(user: User): Promise<Account> {
  const [pendingEmail, lastManagerOf] = await Promise.all([
    pendingEmailChange(user.id),
    lastManagedOrganizations(user.id),
  ]);
  return { id: user.id, name: user.name, email: user.email, pendingEmail, lastManagerOf };
}

/** Changes the fields sent (the name). */
export async function updateAccount(user: User, input: AccountUpdateInput): Promise<User> {
  if (input.name === undefined || input.name === user.name) return user;
  await sequelize.transaction(async (transaction) => {
    const before = user.name;
    await user.update({ name: input.name }, { transaction });
    await recordAudit(
      {
        organizationId: null,
        actorUserId: user.id,
        action: 'user.update',
        entityType: 'user',
        entityId: user.id,
        changes: { name: [before, input.name] },
      },
      transaction,
    );
  });
  return user;
}

/** The current password, checked under the account's sign-in delay; 429 or 422 when not. */
async function requireCurrentPassword(user: User, currentPassword: string) {
  const key = throttleKey(user.email);
  const wait = await reserveAttempt(key);
  if (wait) {
    throw new AppError(
      429,
      'throttled',
      `Too many wrong passwords. Wait ${waitInWords(wait.retryAfterSeconds)} and try again.`,
    );
  }
  if (!(await checkPassword(currentPassword, user.passwordHash))) {
    throw invalid({ currentPassword: 'That is not your current password' });
  }
  await forgetFailures(key);
}

/**
 * Asks to move the account to a new address: a link goes to it, and the account keeps its
 * address until the link is opened. An address another account holds gets a notice instead of a
 * link, and the answer is the same, so a signed-in person cannot probe for accounts.
 */
export async function requestEmailChange(
  user: User,
  newEmail: string,
  currentPassword: string,
): Promise<string> {
  if (newEmail === user.email.toLowerCase()) {
    throw invalid({ email: 'This is your e-mail address already' });
  }
  await requireCurrentPassword(user, currentPassword);
  await sequelize.transaction(async (transaction) => {
    await voidVerifications({ purpose: 'email_change', userId: user.id }, transaction);
    const { token, row } = await issueVerification(
      { purpose: 'email_change', email: newEmail, userId: user.id, name: null, passwordHash: null },
      transaction,
    );
    const taken = await User.findOne({ where: emailIs('email', newEmail), transaction });
    const link = `${env.APP_URL}/confirm-email?token=${token}`;
    await queueMessage(
      {
        organizationId: null,
        recipient: newEmail,
        kind: taken ? 'email_change_taken' : 'email_change_confirm',
        periodKey: row.id,
        ...(taken
          ? emailChangeTakenMail()
          : emailChangeConfirmMail(user.name, newEmail, link, VERIFY_HOURS)),
      },
      transaction,
    );
    await recordAudit(
      {
        organizationId: null,
        actorUserId: user.id,
        action: 'user.email_change_request',
        entityType: 'user',
        entityId: user.id,
      },
      transaction,
    );
  });
  return newEmail;
}

const CHANGE_LINK_USED =
  'This link has expired or was already used. Ask for the change again from your account page.';
const addressTaken = () =>
  invalid({ token: 'That address belongs to another account now, so the change was not made.' });

/** Opens an address change's link: the account signs in with the new address from now on. */
export async function confirmEmailChange(token: string): Promise<User> {
  try {
    return await sequelize.transaction(async (transaction) => {
      const link = await useVerification(token, 'email_change', CHANGE_LINK_USED, transaction);
      const user = await User.findByPk(link.userId!, {
        lock: transaction.LOCK.UPDATE,
        transaction,
      });
      if (!user) throw invalid({ token: CHANGE_LINK_USED });
      const holder = await User.findOne({ where: emailIs('email', link.email), transaction });
      if (holder && holder.id !== user.id) throw addressTaken();
      const oldEmail = user.email;
      await user.update({ email: link.email }, { transaction });
      await voidVerifications({ purpose: 'email_change', userId: user.id }, transaction);
      await queueMessage(
        {
          organizationId: null,
          recipient: oldEmail,
          kind: 'email_changed',
          periodKey: link.id,
          ...emailChangedMail(user.name, link.email),
        },
        transaction,
      );
      await recordAudit(
        {
          organizationId: null,
          actorUserId: user.id,
          action: 'user.email_change',
          entityType: 'user',
          entityId: user.id,
          changes: { email: [oldEmail, link.email] },
        },
        transaction,
      );
      return user;
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw addressTaken();
    throw error;
  }
}

/**
 * Deletes the account with its memberships and sessions (what it recorded stays, without its
 * name). Refused with 409 while it is the last manager of an organization, naming each one.
 */
export async function deleteAccount(user: User, currentPassword: string): Promise<void> {
  await requireCurrentPassword(user, currentPassword);
  await sequelize.transaction(async (transaction) => {
    // The organizations' rows are locked so two managers cannot both leave at the same moment.
    await sequelize.query(
      `SELECT id FROM organizations WHERE id IN
         (SELECT organization_id FROM memberships WHERE user_id = :userId)
       ORDER BY id FOR UPDATE`,
      { replacements: { userId: user.id }, type: QueryTypes.SELECT, transaction },
    );
    const last = await lastManagedOrganizations(user.id, transaction);
    if (last.length) {
      const names = last.map((o) => o.name).join(', ');
      throw new AppError(
        409,
        'last_manager',
        `You are the last manager of ${names}. Make someone else its manager, or delete the organization, before deleting your account.`,
      );
    }
    await User.destroy({ where: { id: user.id }, transaction });
    await recordAudit(
      {
        organizationId: null,
        actorUserId: null,
        action: 'user.delete',
        entityType: 'user',
        entityId: user.id,
      },
      transaction,
    );
  });
  await forgetFailures(throttleKey(user.email));
}
