import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import { numericColumn } from './columns';
import type { MeterChangeKind, ReadingSource } from '../../shared/constants';

export class MeterReading extends Model<
  InferAttributes<MeterReading>,
  InferCreationAttributes<MeterReading>
> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare machineId: string;
  /** the meter read (migration 0026); left out, the database binds the machine's primary meter */
  declare meterId: CreationOptional<string>;
  /** the value shown on the meter fitted at the time */
  declare value: number;
  /** value on the machine's lifetime scale (continuous across meter replacements) */
  declare lifetimeValue: number;
  declare takenAt: Date;
  declare source: CreationOptional<ReadingSource>;
  declare enteredBy: string | null;
  declare importKey: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

MeterReading.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    machineId: { type: DataTypes.UUID, allowNull: false },
    // NOT NULL in the table; left out, the database binds the primary meter (migration 0026)
    meterId: { type: DataTypes.UUID, allowNull: true },
    value: numericColumn('value', 14, 2, false),
    lifetimeValue: numericColumn('lifetimeValue', 14, 2, false),
    takenAt: { type: DataTypes.DATE, allowNull: false },
    source: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'manual' },
    enteredBy: { type: DataTypes.UUID, allowNull: true },
    importKey: { type: DataTypes.TEXT, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'meter_readings' },
);

export class MeterReplacement extends Model<
  InferAttributes<MeterReplacement>,
  InferCreationAttributes<MeterReplacement>
> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare machineId: string;
  /** the meter replaced or reset; left out, the machine's primary meter */
  declare meterId: CreationOptional<string>;
  /** 'replacement' (a new meter fitted) or 'reset' (the same counter zeroed) */
  declare kind: CreationOptional<MeterChangeKind>;
  declare replacedAt: Date;
  declare oldFinalValue: number;
  declare newStartValue: number;
  declare note: CreationOptional<string>;
  declare enteredBy: string | null;
  declare createdAt: CreationOptional<Date>;
}

MeterReplacement.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    machineId: { type: DataTypes.UUID, allowNull: false },
    // NOT NULL in the table; left out, the database binds the primary meter (migration 0026)
    meterId: { type: DataTypes.UUID, allowNull: true },
    kind: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'replacement' },
    replacedAt: { type: DataTypes.DATE, allowNull: false },
    oldFinalValue: numericColumn('oldFinalValue', 14, 2, false),
    newStartValue: numericColumn('newStartValue', 14, 2, false),
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    enteredBy: { type: DataTypes.UUID, allowNull: true },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'meter_replacements', updatedAt: false },
);
