// Single-use links that confirm an e-mail address (a sign-up's, or an address change's): a fresh
// token goes in the e-mail, only its hash is stored; opening the link uses it once.
import { Op, type Transaction, type WhereOptions } from 'sequelize';
import { sequelize } from '../db';
import { invalid } from '../errors';
import { EmailVerification } from '../models';
import type { EmailVerificationPurpose } from '../models/email-verification';
import { hashToken, newToken } from '../infra/tokens';

export const VERIFY_HOURS = 24;
// Links are kept this long past their expiry (who tried to sign up when), then dropped.
const KEEP_EXPIRED_DAYS = 7;

type Fields = Pick<EmailVerification, 'purpose' | 'email' | 'userId' | 'name' | 'passwordHash'>;

/** Stores a new link for the address and returns its token (for the e-mail). */
export async function issueVerification(fields: Fields, transaction: Transaction) {
  const { token, hash } = newToken();
  const row = await EmailVerification.create(
    {
      ...fields,
      email: fields.email.toLowerCase(),
      tokenHash: hash,
      expiresAt: new Date(Date.now() + VERIFY_HOURS * 3600_000),
      usedAt: null,
    },
    { transaction },
  );
  return { token, row };
}

/** Ends the open links matching `where` (a newer one replaces them, or one was used). */
export async function voidVerifications(
  where: WhereOptions<EmailVerification>,
  transaction: Transaction,
) {
  await EmailVerification.update(
    { expiresAt: new Date() },
    { where: { ...where, usedAt: null, expiresAt: { [Op.gt]: new Date() } }, transaction },
  );
}

/** Drops links long expired, used or not (never an open one). */
export async function dropExpiredVerifications(transaction: Transaction) {
  await EmailVerification.destroy({
    where: { expiresAt: { [Op.lt]: new Date(Date.now() - KEEP_EXPIRED_DAYS * 86_400_000) } },
    transaction,
  });
}

/**
 * Uses the open link of this token and purpose, locked for the transaction; an unknown, used or
 * expired one is refused on the `token` field with `whenInvalid`.
 */
export async function useVerification(
  token: string,
  purpose: EmailVerificationPurpose,
  whenInvalid: string,
  transaction: Transaction,
): Promise<EmailVerification> {
  const row = await EmailVerification.findOne({
    where: {
      tokenHash: hashToken(token),
      purpose,
      usedAt: null,
      expiresAt: { [Op.gt]: new Date() },
    },
    lock: transaction.LOCK.UPDATE,
    transaction,
  });
  if (!row) throw invalid({ token: whenInvalid });
  await row.update({ usedAt: new Date() }, { transaction });
  return row;
}

/** The open address change of a user, if any (the newest). */
export async function pendingEmailChange(userId: string): Promise<string | null> {
  const row = await EmailVerification.findOne({
    where: {
      userId,
      purpose: 'email_change',
      usedAt: null,
      expiresAt: { [Op.gt]: new Date() },
    },
    order: [['createdAt', 'DESC']],
  });
  return row?.email ?? null;
}

/** An e-mail compared case-insensitively, for `where`. */
export const emailIs = (column: string, email: string) =>
  sequelize.where(sequelize.fn('lower', sequelize.col(column)), email.toLowerCase());
