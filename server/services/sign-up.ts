// Signing up: the person's name, address and password wait in a single-use link sent to the
// address; the account exists only once the link is opened. Whether or not the address has an
// account, the answer is the same and takes the same time; its owner is told someone tried.
import { randomUUID } from 'node:crypto';
import { UniqueConstraintError } from 'sequelize';
import { sequelize } from '../db';
import { env } from '../env';
import { invalid } from '../errors';
import { User } from '../models';
import type { SignUpInput } from '../../shared/schemas/account';
import { signUpConfirmMail, signUpExistingMail } from './account-mail';
import { recordAudit } from '../infra/audit';
import {
  VERIFY_HOURS,
  dropExpiredVerifications,
  emailIs,
  issueVerification,
  useVerification,
  voidVerifications,
} from './email-verifications';
import { queueMessage } from '../infra/mailer';
import { hashPassword } from '../infra/password-hash';
import { signUpClosed, signUpIsOpen } from './sign-up-gate';

// A sign-up answers no sooner than this after it arrived, known address or not: the new one
// writes a link, the known one only a message, and the time must not tell them apart.
export const SIGN_UP_ANSWER_MS = 400;

const waitUntil = (at: number) =>
  new Promise<void>((resolve) => setTimeout(resolve, Math.max(0, at - Date.now())));

/**
 * Starts a sign-up: a confirmation link to a new address, or a "someone tried" message to the
 * owner of a known one. Answers after SIGN_UP_ANSWER_MS either way.
 */
export async function requestSignUp(input: SignUpInput): Promise<void> {
  if (!signUpIsOpen()) throw signUpClosed();
  const answerAt = Date.now() + SIGN_UP_ANSWER_MS;
  try {
    // Hashed for both kinds of address, so both take the bcrypt time.
    const passwordHash = await hashPassword(input.password);
    await sequelize.transaction(async (transaction) => {
      await dropExpiredVerifications(transaction);
      const owner = await User.findOne({ where: emailIs('email', input.email), transaction });
      if (owner) {
        const words = signUpExistingMail(owner.name);
        await queueMessage(
          {
            organizationId: null,
            recipient: owner.email,
            kind: 'sign_up_existing',
            periodKey: randomUUID(),
            ...words,
          },
          transaction,
        );
        return;
      }
      // Every attempt keeps its own link and password: another person's sign-up with this
      // address neither voids the owner's link nor changes what it sets.
      const { token, row } = await issueVerification(
        {
          purpose: 'sign_up',
          email: input.email,
          userId: null,
          name: input.name,
          passwordHash,
        },
        transaction,
      );
      const link = `${env.APP_URL}/verify-email?token=${token}`;
      await queueMessage(
        {
          organizationId: null,
          recipient: input.email,
          kind: 'sign_up_confirm',
          periodKey: row.id,
          ...signUpConfirmMail(input.name, link, VERIFY_HOURS),
        },
        transaction,
      );
    });
  } finally {
    await waitUntil(answerAt);
  }
}

const LINK_USED =
  'This link has expired or was already used. Sign in, or sign up again for a new link.';

/**
 * Opens a sign-up's link: creates the account with the name and password of that sign-up, once.
 * The address's other open links end. An address that got an account meanwhile is refused.
 */
export async function confirmSignUp(token: string): Promise<User> {
  try {
    return await sequelize.transaction(async (transaction) => {
      const link = await useVerification(token, 'sign_up', LINK_USED, transaction);
      const taken = await User.findOne({ where: emailIs('email', link.email), transaction });
      if (taken) throw accountExists();
      const user = await User.create(
        { email: link.email, name: link.name!, passwordHash: link.passwordHash! },
        { transaction },
      );
      await voidVerifications({ purpose: 'sign_up', email: link.email }, transaction);
      await recordAudit(
        {
          organizationId: null,
          actorUserId: user.id,
          action: 'user.sign_up',
          entityType: 'user',
          entityId: user.id,
        },
        transaction,
      );
      return user;
    });
  } catch (error) {
    // Two links of one address opened at the same moment: the second finds the first's account.
    if (error instanceof UniqueConstraintError) throw accountExists();
    throw error;
  }
}

const accountExists = () =>
  invalid({ token: 'This address has an account already: sign in with it instead.' });
