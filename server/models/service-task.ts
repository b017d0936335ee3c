import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import { numericColumn } from './columns';
import type { StoredTaskPart, TaskFluid } from '../../shared/schemas/schedule';
import type { SeasonAnchor } from '../../shared/domain/season-dates';

export class ServiceTask extends Model<
  InferAttributes<ServiceTask>,
  InferCreationAttributes<ServiceTask>
> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare machineId: string;
  /** the meter its interval counts on (migration 0026); left out, the machine's primary meter */
  declare meterId: CreationOptional<string>;
  declare name: string;
  declare intervalMeter: number | null;
  declare intervalDays: number | null;
  declare firstServiceMeter: number | null;
  declare warnMeter: number | null;
  declare warnDays: number | null;
  declare parts: CreationOptional<StoredTaskPart[]>;
  declare fluids: CreationOptional<TaskFluid[]>;
  declare labourHours: number | null;
  declare instructions: CreationOptional<string>;
  declare safetyNotes: CreationOptional<string>;
  declare hazards: CreationOptional<string[]>;
  /** daily care: signed off by the operator in the walkaround, never a service record or a mail */
  declare dailyCare: CreationOptional<boolean>;
  declare lastDoneMeter: number | null;
  /** ISO date, local to the organization */
  declare lastDoneOn: string | null;
  /** added without a last service; counts only while the machine came with hours (see due point) */
  declare historyUnknown: CreationOptional<boolean>;
  /** "start counting from now" in place of an unknown last service: lifetime meter and ISO date */
  declare countFromMeter: CreationOptional<number | null>;
  declare countFromOn: CreationOptional<string | null>;
  /** season service: due seasonOffsetDays before the machine's season starts or after it ends */
  declare seasonAnchor: CreationOptional<SeasonAnchor | null>;
  declare seasonOffsetDays: CreationOptional<number | null>;
  declare position: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

ServiceTask.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    machineId: { type: DataTypes.UUID, allowNull: false },
    // NOT NULL in the table; left out, the database binds the primary meter (migration 0026)
    meterId: { type: DataTypes.UUID, allowNull: true },
    name: { type: DataTypes.TEXT, allowNull: false },
    intervalMeter: numericColumn('intervalMeter', 12, 2, true),
    intervalDays: { type: DataTypes.INTEGER, allowNull: true },
    firstServiceMeter: numericColumn('firstServiceMeter', 12, 2, true),
    warnMeter: numericColumn('warnMeter', 12, 2, true),
    warnDays: { type: DataTypes.INTEGER, allowNull: true },
    parts: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    fluids: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    labourHours: numericColumn('labourHours', 6, 2, true),
    instructions: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    safetyNotes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    hazards: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
    dailyCare: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    lastDoneMeter: numericColumn('lastDoneMeter', 14, 2, true),
    lastDoneOn: { type: DataTypes.DATEONLY, allowNull: true },
    historyUnknown: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    countFromMeter: numericColumn('countFromMeter', 14, 2, true),
    countFromOn: { type: DataTypes.DATEONLY, allowNull: true },
    seasonAnchor: { type: DataTypes.TEXT, allowNull: true },
    seasonOffsetDays: { type: DataTypes.INTEGER, allowNull: true },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'service_tasks' },
);
