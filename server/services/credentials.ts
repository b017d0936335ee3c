// Signing in and changing a password: the bcrypt compare, the account's sign-in delay
// (services/sign-in-throttle.ts) and, on a change, the end of the user's other sessions.
import { sequelize } from '../db';
import { AppError, invalid } from '../errors';
import { User } from '../models';
import { recordAudit } from '../infra/audit';
import { checkPassword, hashPassword, needsRehash } from '../infra/password-hash';
import { endOtherSessions } from '../infra/session';
import { forgetFailures, reserveAttempt, throttleKey, waitInWords } from './sign-in-throttle';

/** The account of an e-mail, compared case-insensitively. */
export const findUserByEmail = (email: string) =>
  User.findOne({
    where: sequelize.where(sequelize.fn('lower', sequelize.col('email')), email.toLowerCase()),
  });

/**
 * The user with these credentials, or an AppError 401 naming no detail. Known and unknown
 * e-mails take the same steps (one lookup, one bcrypt compare at the same cost); the right
 * password clears the account's failed attempts.
 */
export async function verifyCredentials(email: string, password: string): Promise<User> {
  const user = await findUserByEmail(email);
  const ok = await checkPassword(password, user?.passwordHash ?? null);
  if (!user?.passwordHash || !ok) {
    throw new AppError(
      401,
      'invalid_credentials',
      'That e-mail and password do not match an account',
    );
  }
  await forgetFailures(throttleKey(email));
  if (needsRehash(user.passwordHash)) {
    await user.update({ passwordHash: await hashPassword(password) });
  }
  return user;
}

/**
 * Changes the password of a signed-in user who knows the current one (wrong guesses slow the
 * account down like failed sign-ins), and ends every other session of theirs: the one making
 * the change stays signed in.
 */
export async function changePassword(
  user: User,
  sessionId: string,
  currentPassword: string,
  password: string,
): Promise<void> {
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
  const passwordHash = await hashPassword(password);
  await sequelize.transaction(async (transaction) => {
    await User.update({ passwordHash }, { where: { id: user.id }, transaction });
    await endOtherSessions(user.id, sessionId, transaction);
    await recordAudit(
      {
        organizationId: null,
        actorUserId: user.id,
        action: 'password.change',
        entityType: 'user',
        entityId: user.id,
      },
      transaction,
    );
  });
}
