import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';

/** queued → sending (claimed, with a lease) → sent; back to queued to retry; failed after the last try. */
export type NotificationStatus = 'queued' | 'sending' | 'sent' | 'failed';

export class Notification extends Model<
  InferAttributes<Notification>,
  InferCreationAttributes<Notification>
> {
  declare id: CreationOptional<string>;
  declare organizationId: string | null;
  declare recipient: string;
  declare kind: string;
  declare periodKey: string;
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string | null;
  declare headers: CreationOptional<Record<string, string>>;
  declare status: CreationOptional<NotificationStatus>;
  declare attempts: CreationOptional<number>;
  declare lastError: string | null;
  declare nextAttemptAt: CreationOptional<Date>;
  declare sentAt: Date | null;
  declare claimedAt: CreationOptional<Date | null>;
  /** while `sending`: the claim's lease; once it has passed, another worker may retry */
  declare claimedUntil: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Notification.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: true },
    recipient: { type: DataTypes.TEXT, allowNull: false },
    kind: { type: DataTypes.TEXT, allowNull: false },
    periodKey: { type: DataTypes.TEXT, allowNull: false },
    subject: { type: DataTypes.TEXT, allowNull: false },
    textBody: { type: DataTypes.TEXT, allowNull: false },
    htmlBody: { type: DataTypes.TEXT, allowNull: true },
    headers: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'queued' },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    lastError: { type: DataTypes.TEXT, allowNull: true },
    nextAttemptAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    sentAt: { type: DataTypes.DATE, allowNull: true },
    claimedAt: { type: DataTypes.DATE, allowNull: true },
    claimedUntil: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'notifications' },
);
