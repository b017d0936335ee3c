import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';

/** A private iCalendar feed: the farm's (userId null) or one person's; the token is revocable. */
export class CalendarFeed extends Model<
  InferAttributes<CalendarFeed>,
  InferCreationAttributes<CalendarFeed>
> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare userId: string | null;
  declare tokenHash: string;
  declare createdBy: string | null;
  declare revokedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

CalendarFeed.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    userId: { type: DataTypes.UUID, allowNull: true },
    tokenHash: { type: DataTypes.TEXT, allowNull: false },
    createdBy: { type: DataTypes.UUID, allowNull: true },
    revokedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'calendar_feeds' },
);
