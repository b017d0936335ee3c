import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
} from 'sequelize';
import { sequelize } from '../db';
import type { User } from './user';

/** One signed-in browser or device: the session cookie names it; revoking it ends that sign-in. */
export class Session extends Model<InferAttributes<Session>, InferCreationAttributes<Session>> {
  declare id: CreationOptional<string>;
  declare userId: string;
  declare userAgent: string;
  declare createdAt: CreationOptional<Date>;
  declare lastSeenAt: CreationOptional<Date>;
  declare expiresAt: Date;
  declare revokedAt: Date | null;
  declare user?: NonAttribute<User>;
}

Session.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    userId: { type: DataTypes.UUID, allowNull: false },
    userAgent: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    createdAt: DataTypes.DATE,
    lastSeenAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    revokedAt: { type: DataTypes.DATE, allowNull: true },
  },
  { sequelize, tableName: 'sessions', updatedAt: false },
);
