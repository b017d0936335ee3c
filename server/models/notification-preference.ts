import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import type { DigestFrequency } from '../../shared/schemas/notifications';

/** One member's due-digest choices; no row means the role's default (see services/digest-preferences). */
export class NotificationPreference extends Model<
  InferAttributes<NotificationPreference>,
  InferCreationAttributes<NotificationPreference>
> {
  declare membershipId: string;
  declare organizationId: string;
  declare frequency: DigestFrequency;
  /** ISO weekday of the weekly digest: 1 = Monday … 7 = Sunday */
  declare weekday: CreationOptional<number>;
  /** only these machines (empty = every machine the person sees) */
  declare machineIds: CreationOptional<string[]>;
  /** only these categories (empty = every category) */
  declare categories: CreationOptional<string[]>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

NotificationPreference.init(
  {
    membershipId: { type: DataTypes.UUID, primaryKey: true },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    frequency: { type: DataTypes.TEXT, allowNull: false },
    weekday: { type: DataTypes.SMALLINT, allowNull: false, defaultValue: 1 },
    machineIds: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
    categories: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'notification_preferences' },
);
