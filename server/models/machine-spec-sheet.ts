import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import type { SpecSheetData } from '../../shared/schemas/spec-sheet';

/** A machine's spec sheet (migration 0019): one row per machine, one JSONB column per section. */
export class MachineSpecSheet extends Model<
  InferAttributes<MachineSpecSheet>,
  InferCreationAttributes<MachineSpecSheet>
> {
  declare machineId: string;
  declare organizationId: string;
  declare capacities: CreationOptional<SpecSheetData['capacities']>;
  declare extraCapacities: CreationOptional<SpecSheetData['extraCapacities']>;
  declare filters: CreationOptional<SpecSheetData['filters']>;
  declare extraFilters: CreationOptional<SpecSheetData['extraFilters']>;
  declare tyrePressures: CreationOptional<SpecSheetData['tyrePressures']>;
  declare torques: CreationOptional<SpecSheetData['torques']>;
  declare testPressures: CreationOptional<SpecSheetData['testPressures']>;
  declare notes: CreationOptional<string>;
  declare updatedBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

const json = (empty: object) => ({
  type: DataTypes.JSONB,
  allowNull: false,
  defaultValue: empty,
});

MachineSpecSheet.init(
  {
    machineId: { type: DataTypes.UUID, primaryKey: true },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    capacities: json({}),
    extraCapacities: json([]),
    filters: json({}),
    extraFilters: json([]),
    tyrePressures: json({}),
    torques: json([]),
    testPressures: json([]),
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    updatedBy: { type: DataTypes.UUID, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'machine_spec_sheets' },
);
