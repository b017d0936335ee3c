import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../db';
import type { OrganizationKind, UnitSystem } from '../../shared/constants';

export class Organization extends Model<
  InferAttributes<Organization>,
  InferCreationAttributes<Organization>
> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare kind: OrganizationKind;
  declare timeZone: CreationOptional<string>;
  declare units: CreationOptional<UnitSystem>;
  /** ISO 4217 code; money amounts are integer minor units of it */
  declare currency: CreationOptional<string>;
  /** the farm's labour rate per hour, in minor units of its currency */
  declare labourRateMinor: CreationOptional<number>;
  /** the farm's usual season, months 1–12 */
  declare seasonMonths: CreationOptional<number[]>;
  /** local hour (0–23) the due digest goes out */
  declare digestHour: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Organization.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    name: { type: DataTypes.TEXT, allowNull: false },
    kind: { type: DataTypes.TEXT, allowNull: false },
    timeZone: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'UTC' },
    units: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'metric' },
    currency: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'USD' },
    labourRateMinor: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    seasonMonths: { type: DataTypes.ARRAY(DataTypes.INTEGER), allowNull: false, defaultValue: [] },
    digestHour: { type: DataTypes.SMALLINT, allowNull: false, defaultValue: 6 },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'organizations' },
);
