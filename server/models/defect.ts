import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import type { DefectSeverity, DefectStatus } from '../../shared/schemas/defects';

export class Defect extends Model<InferAttributes<Defect>, InferCreationAttributes<Defect>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare machineId: string;
  declare title: string;
  declare description: CreationOptional<string>;
  declare severity: DefectSeverity;
  declare status: CreationOptional<DefectStatus>;
  declare walkaroundId: string | null;
  /** the checklist item it was found on, so the next walkaround adds to it instead of doubling it */
  declare itemId: string | null;
  declare photoId: string | null;
  declare reportCount: CreationOptional<number>;
  declare lastReportedAt: CreationOptional<Date>;
  declare reportedBy: string | null;
  declare assignedTo: string | null;
  declare fixedAt: Date | null;
  declare fixedBy: string | null;
  declare fixedByRecordId: string | null;
  declare fixNote: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Defect.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    machineId: { type: DataTypes.UUID, allowNull: false },
    title: { type: DataTypes.TEXT, allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    severity: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'open' },
    walkaroundId: { type: DataTypes.UUID, allowNull: true },
    itemId: { type: DataTypes.TEXT, allowNull: true },
    photoId: { type: DataTypes.UUID, allowNull: true },
    reportCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    lastReportedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    reportedBy: { type: DataTypes.UUID, allowNull: true },
    assignedTo: { type: DataTypes.UUID, allowNull: true },
    fixedAt: { type: DataTypes.DATE, allowNull: true },
    fixedBy: { type: DataTypes.UUID, allowNull: true },
    fixedByRecordId: { type: DataTypes.UUID, allowNull: true },
    fixNote: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'defects' },
);
