import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import { numericColumn } from './columns';
import type { ReadingPoint, UsageEstimate, DuePoint } from '../../shared/domain/types';

/** Per-meter summary of its readings (keyed by meter since migration 0026), kept with every reading write. */
export class MachineForecast extends Model<
  InferAttributes<MachineForecast>,
  InferCreationAttributes<MachineForecast>
> {
  declare meterId: string;
  declare machineId: string;
  declare organizationId: string;
  /** one point per local day that has readings: the day's last lifetime value */
  declare daily: CreationOptional<ReadingPoint[]>;
  declare readingCount: CreationOptional<number>;
  declare lastValue: number | null;
  /** the value on the meter fitted now at the last reading */
  declare lastRawValue: number | null;
  declare lastTakenAt: Date | null;
  declare firstTakenAt: Date | null;
  /** lifetime value of the first reading: above 0 means the machine came with hours */
  declare firstValue: CreationOptional<number | null>;
  declare usage: UsageEstimate | null;
  declare computedOn: string | null;
  declare updatedAt: CreationOptional<Date>;
}

MachineForecast.init(
  {
    meterId: { type: DataTypes.UUID, primaryKey: true },
    machineId: { type: DataTypes.UUID, allowNull: false },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    daily: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    readingCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    lastValue: numericColumn('lastValue', 14, 2, true),
    lastRawValue: numericColumn('lastRawValue', 14, 2, true),
    lastTakenAt: { type: DataTypes.DATE, allowNull: true },
    firstTakenAt: { type: DataTypes.DATE, allowNull: true },
    firstValue: numericColumn('firstValue', 14, 2, true),
    usage: { type: DataTypes.JSONB, allowNull: true },
    computedOn: { type: DataTypes.DATEONLY, allowNull: true },
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'machine_forecasts', createdAt: false },
);

/** Stored due point of one task, refreshed with its machine's forecast. */
export class TaskDuePoint extends Model<
  InferAttributes<TaskDuePoint>,
  InferCreationAttributes<TaskDuePoint>
> {
  declare taskId: string;
  declare organizationId: string;
  declare machineId: string;
  declare status: DuePoint['status'];
  declare sortDate: string | null;
  declare due: DuePoint;
  declare computedOn: string;
  declare updatedAt: CreationOptional<Date>;
}

TaskDuePoint.init(
  {
    taskId: { type: DataTypes.UUID, primaryKey: true },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    machineId: { type: DataTypes.UUID, allowNull: false },
    status: { type: DataTypes.TEXT, allowNull: false },
    sortDate: { type: DataTypes.DATEONLY, allowNull: true },
    due: { type: DataTypes.JSONB, allowNull: false },
    computedOn: { type: DataTypes.DATEONLY, allowNull: false },
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'task_due_points', createdAt: false },
);
