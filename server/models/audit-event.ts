import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';

export class AuditEvent extends Model<
  InferAttributes<AuditEvent>,
  InferCreationAttributes<AuditEvent>
> {
  declare id: CreationOptional<number>;
  declare organizationId: string | null;
  declare actorUserId: string | null;
  declare action: string;
  declare entityType: string;
  declare entityId: string | null;
  declare changes: CreationOptional<Record<string, unknown>>;
  declare createdAt: CreationOptional<Date>;
}

AuditEvent.init(
  {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    organizationId: { type: DataTypes.UUID, allowNull: true },
    actorUserId: { type: DataTypes.UUID, allowNull: true },
    action: { type: DataTypes.TEXT, allowNull: false },
    entityType: { type: DataTypes.TEXT, allowNull: false },
    entityId: { type: DataTypes.TEXT, allowNull: true },
    changes: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'audit_events', updatedAt: false },
);
