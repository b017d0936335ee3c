import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import { minorUnitsColumn } from './columns';
import type { MachineCategory, MachineStatus, MeterUnit } from '../../shared/constants';
import type { MachineClass } from '../../shared/domain/service-library';
import type { SeasonPlans } from '../../shared/domain/season-use';

export class Machine extends Model<InferAttributes<Machine>, InferCreationAttributes<Machine>> {
  declare id: CreationOptional<string>;
  declare organizationId: string;
  declare fleetNumber: string;
  declare name: string;
  declare category: MachineCategory;
  /** the service library's class (shared/domain/service-library); null until one is picked */
  declare machineClass: CreationOptional<MachineClass | null>;
  declare make: CreationOptional<string>;
  declare model: CreationOptional<string>;
  declare serialNumber: CreationOptional<string>;
  /** the id a telematics feed knows the machine by (migration 0027); unique per organization */
  declare telematicsId: CreationOptional<string | null>;
  declare year: number | null;
  /** minor units of the organization's currency */
  declare purchasePriceMinor: number | null;
  /** list price when new, minor units of the organization's currency */
  declare listPriceMinor: number | null;
  declare meterUnit: CreationOptional<MeterUnit>;
  declare status: CreationOptional<MachineStatus>;
  /** months (1–12) the machine normally works; empty = all year */
  declare seasonMonths: CreationOptional<number[]>;
  /** plans by season year (migration 0029; shared/domain/season-use.ts) */
  declare seasonPlans: CreationOptional<SeasonPlans>;
  declare photoKey: string | null;
  declare notes: CreationOptional<string>;
  /** restricted use (migration 0021): why, since when and by whom; all null when unrestricted */
  declare restrictionReason: CreationOptional<string | null>;
  declare restrictedAt: CreationOptional<Date | null>;
  declare restrictedBy: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Machine.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organizationId: { type: DataTypes.UUID, allowNull: false },
    fleetNumber: { type: DataTypes.TEXT, allowNull: false },
    name: { type: DataTypes.TEXT, allowNull: false },
    category: { type: DataTypes.TEXT, allowNull: false },
    machineClass: { type: DataTypes.TEXT, allowNull: true },
    make: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    model: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    serialNumber: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    telematicsId: { type: DataTypes.TEXT, allowNull: true },
    year: { type: DataTypes.INTEGER, allowNull: true },
    purchasePriceMinor: minorUnitsColumn('purchasePriceMinor'),
    listPriceMinor: minorUnitsColumn('listPriceMinor'),
    meterUnit: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'h' },
    status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'in_service' },
    seasonMonths: { type: DataTypes.ARRAY(DataTypes.INTEGER), allowNull: false, defaultValue: [] },
    seasonPlans: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    photoKey: { type: DataTypes.TEXT, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    restrictionReason: { type: DataTypes.TEXT, allowNull: true },
    restrictedAt: { type: DataTypes.DATE, allowNull: true },
    restrictedBy: { type: DataTypes.UUID, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'machines' },
);

export class MachineOperator extends Model<
  InferAttributes<MachineOperator>,
  InferCreationAttributes<MachineOperator>
> {
  declare organizationId: string;
  declare machineId: string;
  declare userId: string;
  declare createdAt: CreationOptional<Date>;
}

MachineOperator.init(
  {
    organizationId: { type: DataTypes.UUID, allowNull: false },
    machineId: { type: DataTypes.UUID, primaryKey: true },
    userId: { type: DataTypes.UUID, primaryKey: true },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'machine_operators', updatedAt: false },
);
