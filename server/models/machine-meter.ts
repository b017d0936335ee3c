import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import type { MeterKind, MeterUnit } from '../../shared/constants';

/**
 * One meter of a machine (migration 0026): engine hours, separator hours, a bale counter…
 * Exactly one per machine is primary (a partial unique index); a machine's insert adds it.
 */
export class MachineMeter extends Model<
  InferAttributes<MachineMeter>,
  InferCreationAttributes<MachineMeter>
> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare machineId: string;
  declare kind: MeterKind;
  /** follows from the kind (METER_KIND_UNITS); a CHECK keeps the two together */
  declare unit: MeterUnit;
  declare label: CreationOptional<string>;
  declare isPrimary: CreationOptional<boolean>;
  declare position: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
}

MachineMeter.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    machineId: { type: DataTypes.UUID, allowNull: false },
    kind: { type: DataTypes.TEXT, allowNull: false },
    unit: { type: DataTypes.TEXT, allowNull: false },
    label: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    isPrimary: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'machine_meters', updatedAt: false },
);
