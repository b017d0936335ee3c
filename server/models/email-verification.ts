import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';

export const EMAIL_VERIFICATION_PURPOSES = ['sign_up', 'email_change'] as const;
export type EmailVerificationPurpose = (typeof EMAIL_VERIFICATION_PURPOSES)[number];

/**
 * A single-use link that confirms an address: a sign-up's (no account yet: the link carries the
 * name and password hash the account is made with), or the address an account wants to change
 * to (email_change, with its user). Only the token's hash is stored.
 */
export class EmailVerification extends Model<
  InferAttributes<EmailVerification>,
  InferCreationAttributes<EmailVerification>
> {
  declare id: CreationOptional<string>;
  declare purpose: EmailVerificationPurpose;
  declare userId: string | null;
  declare email: string;
  declare name: string | null;
  declare passwordHash: string | null;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

EmailVerification.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    purpose: { type: DataTypes.TEXT, allowNull: false },
    userId: { type: DataTypes.UUID, allowNull: true },
    email: { type: DataTypes.TEXT, allowNull: false },
    name: { type: DataTypes.TEXT, allowNull: true },
    passwordHash: { type: DataTypes.TEXT, allowNull: true },
    tokenHash: { type: DataTypes.TEXT, allowNull: false },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    usedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'email_verifications' },
);
